import { describe, expect, it } from "vitest";
import { chiefAttention } from "@/lib/tech/chief-attention";
import { formatClockTime } from "@/lib/tech/format-clock-time";
import { formatWhoAndWhen } from "@/lib/tech/format-who-and-when";

describe("chiefAttention: why a car waits for the chief scrutineer, in words", () => {
  it("names a disagreement and a too-close-to-call reading", () => {
    const words = chiefAttention({
      status: "re-measure",
      flags: ["disagreement", "inconclusive"],
      rejectedOverride: null,
    });
    expect(words[0]).toMatch(/^Readings disagree/);
    expect(words[1]).toMatch(/^Too close to call/);
    expect(words).toHaveLength(2);
  });

  it("puts an override that was not applied first, with who saved it, when, and why", () => {
    const words = chiefAttention({
      status: "waiting",
      flags: ["override-invalid"],
      rejectedOverride: {
        whoAndWhen: "Helen Marsh at 10:42 on Sat 16 May",
        problem: "Kestrel is below Harrier, the class this car was entered in.",
      },
    });
    expect(words).toEqual([
      "Override not applied — saved by Helen Marsh at 10:42 on Sat 16 May: Kestrel is below Harrier, the class this car was entered in. The computed verdict stands until you save one that fits or void it.",
    ]);
  });

  it("says a held car is held unless the hold is the chief's own decision", () => {
    expect(chiefAttention({ status: "held", flags: [], rejectedOverride: null })[0]).toMatch(
      /^Held/,
    );
    expect(
      chiefAttention({ status: "held", flags: ["overridden"], rejectedOverride: null }),
    ).toEqual([]);
    expect(chiefAttention({ status: "cleared", flags: [], rejectedOverride: null })).toEqual([]);
  });
});

describe("who and when, on the event's clock", () => {
  it("shows the device time in the event's zone", () => {
    // Source: IANA tz database — Europe/London is UTC+1 (BST) on 16 May 2026.
    expect(
      formatWhoAndWhen({
        name: "Helen Marsh",
        deviceTime: "2026-05-16T09:42:30.000Z",
        timeZone: "Europe/London",
      }),
    ).toBe("Helen Marsh at 10:42 on Sat 16 May");
    expect(formatClockTime("2026-05-16T09:42:07.000Z", "Europe/London")).toBe("10:42:07");
    // Source: IANA tz database — America/Chicago is UTC−5 (CDT) on 16 May 2026.
    expect(formatClockTime("2026-05-16T09:42:07.000Z", "America/Chicago")).toBe("04:42:07");
  });

  it("says so when the official is no longer listed", () => {
    expect(
      formatWhoAndWhen({ name: null, deviceTime: "2026-01-10T12:00:00Z", timeZone: "UTC" }),
    ).toBe("an official no longer listed for this event at 12:00 on Sat 10 Jan");
  });
});
