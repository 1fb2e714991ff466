import { describe, expect, it } from "vitest";
import { describeOutboxRecord } from "@/components/tech/describe-outbox-record";
import { OutboxPanel } from "@/components/tech/outbox-panel";
import { photoTypeProblem } from "@/components/tech/photo-type-problem";
import { readingExample } from "@/components/tech/reading-example";
import { recordByline } from "@/components/tech/record-byline";
import type { LocalRecord } from "@/lib/offline/local-record";
import { LENGTH_DIMENSIONS, type TechRecord } from "@/lib/scrutineer/records/record-schema";
import { parseLength } from "@/lib/scrutineer/units/parse-length";
import { render, textOf } from "../diagrams/render-markup";
import { checklist, lengthReading, note, reading, voidRecord } from "../scrutineer/fixtures";

const words = {
  unitSystem: "mm" as const,
  itemLabel: (id: string) => ({ harness: "Harness", "head-restraint": "Head restraint" })[id],
  className: (id: string) => ({ merlin: "Merlin" })[id],
};
const scales = { id: "scales", name: "Corner scales", standardUncertainty: 0.5 };

describe("outbox lines", () => {
  it("name readings as people do, with value, unit and corner", () => {
    expect(
      describeOutboxRecord({
        ...words,
        record: lengthReading(1, "wingOverhangMm", 150.5),
        carNumber: 37,
      }),
    ).toBe("Car 37 · Wing overhang 150.5 mm");
    const corners = (["lf", "rr"] as const).map((corner, i) =>
      describeOutboxRecord({
        ...words,
        record: reading(2 + i, {
          dimension: "cornerWeightKg",
          corner,
          value: 312,
          instrument: scales,
        }),
        carNumber: 37,
      }),
    );
    expect(corners).toEqual([
      "Car 37 · Corner weight, left front 312 kg",
      "Car 37 · Corner weight, right rear 312 kg",
    ]);
    // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly: 150.5 mm = 5.93 in.
    expect(
      describeOutboxRecord({
        ...words,
        unitSystem: "in",
        record: lengthReading(4, "wingOverhangMm", 150.5),
        carNumber: 37,
      }),
    ).toBe("Car 37 · Wing overhang 5.93 in");
  });

  it("say what a checklist answer, a note and a void are", () => {
    expect(
      describeOutboxRecord({
        ...words,
        record: checklist(5, { itemId: "head-restraint", result: "not-applicable" }),
        carNumber: 7,
      }),
    ).toBe("Car 7 · Head restraint not fitted");
    expect(
      describeOutboxRecord({ ...words, record: note(6, "Battery clamp loose"), carNumber: 7 }),
    ).toBe("Car 7 · Note: “Battery clamp loose”");
    const typo = lengthReading(7, "wingTopFromGroundMm", 0);
    const records = new Map<string, TechRecord>([[typo.id, typo]]);
    expect(
      describeOutboxRecord({
        ...words,
        record: voidRecord(8, 7, "typed 0 for 1380"),
        carNumber: 7,
        findRecord: (id) => records.get(id),
      }),
    ).toBe("Car 7 · Void of “Wing top height from the ground 0 mm”: typed 0 for 1380");
  });

  it("are never internal names", () => {
    for (const dimension of LENGTH_DIMENSIONS) {
      const line = describeOutboxRecord({
        ...words,
        record: lengthReading(9, dimension, 100),
        carNumber: 1,
      });
      expect(line).not.toContain(dimension);
      expect(line).not.toMatch(/\(|reading/);
    }
  });
});

describe("the outbox when nothing was recorded", () => {
  it("says it is empty instead of 0 of 0 sent over a full bar", () => {
    const markup = render(
      <OutboxPanel
        local={[] as LocalRecord[]}
        online
        running={false}
        onSendNow={() => {}}
        carNumberOf={() => undefined}
        {...words}
        findRecord={() => undefined}
      />,
    );
    expect(textOf(markup)).toContain("Outbox empty — everything is sent");
    expect(markup).not.toContain("0 of 0");
    expect(markup).not.toContain('role="progressbar"');
  });
});

describe("reading examples", () => {
  it("give each dimension its own size in the event's unit", () => {
    const mm = LENGTH_DIMENSIONS.map((d) => readingExample(d, "mm"));
    expect(new Set(mm).size).toBe(LENGTH_DIMENSIONS.length);
    expect(readingExample("endPlateThicknessMm", "mm")).toBe("e.g. 6 mm");
    for (const text of mm) expect(text).toMatch(/^e\.g\. \d+ mm$/);
    // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm: 1450 mm = 57.09 in → 57 1/8" to the eighth;
    // 6 mm = 0.236 in → 1/4"; 1600 mm = 62.99 in → 63".
    expect(readingExample("wingTopFromGroundMm", "in")).toBe('e.g. 57 1/8"');
    expect(readingExample("endPlateThicknessMm", "in")).toBe('e.g. 1/4"');
    expect(readingExample("wingSpanMm", "in")).toBe('e.g. 63"');
    // Each example reads back to the dimension's size through the parser the field uses.
    for (const d of LENGTH_DIMENSIONS) {
      const typed = readingExample(d, "in").replace(/^e\.g\. /, "");
      expect(parseLength(typed, { defaultUnit: "in" }).ok, d).toBe(true);
    }
  });
});

describe("length hints", () => {
  it("lead with the event's unit", () => {
    const mm = parseLength("abc", { defaultUnit: "mm" });
    const inch = parseLength("abc", { defaultUnit: "in" });
    expect(mm.ok || mm.message).toMatch(/write it like 1638\.3 mm, /);
    expect(inch.ok || inch.message).toMatch(/write it like 64\.5 in, /);
  });
});

describe("photos", () => {
  it("refuse a file that does not say it is an image, or is empty", () => {
    expect(photoTypeProblem({ type: "text/plain", size: 40, name: "car.png" })).toMatch(
      /"car\.png" is not a picture/,
    );
    expect(photoTypeProblem({ type: "", size: 40, name: "car.png" })).not.toBeNull();
    expect(photoTypeProblem({ type: "image/png", size: 0 })).toMatch(/empty/);
    expect(photoTypeProblem({ type: "image/jpeg", size: 200_000 })).toBeNull();
  });
});

describe("bylines", () => {
  it("say who and when, in the event's time zone", () => {
    const officials = [{ userId: "alex", name: "Alex Marsh" }];
    // Source: IANA tz database — Europe/London is UTC+1 (BST) on 2026-05-16.
    expect(
      recordByline({
        officialId: "alex",
        deviceTime: "2026-05-16T09:42:00Z",
        me: "sam",
        officials,
        timeZone: "Europe/London",
      }),
    ).toBe("by Alex Marsh · 10:42");
    expect(
      recordByline({
        officialId: "sam",
        deviceTime: "2026-05-16T09:42:00Z",
        me: "sam",
        officials,
        timeZone: "Europe/London",
      }),
    ).toBe("by you · 10:42");
  });
});
