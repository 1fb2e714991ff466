import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import type { ReactElement } from "react";
import { describe, expect, it } from "vitest";
import { CarCard } from "@/components/tech/car-card";
import { ChecklistItemForm } from "@/components/tech/checklist-item-form";
import { TechContext, type TechContextValue } from "@/components/tech/tech-context";
import { VerdictView } from "@/components/tech/verdict-view";
import { demoRuleSet } from "@/db/seed/demo-rule-set";
import type { StoredPack } from "@/lib/offline/save-event-pack";
import type { TechRecord, TechRecordOf } from "@/lib/scrutineer/records/record-schema";
import {
  type RuleSet,
  type RuleSetInput,
  ruleSetSchema,
} from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { partByTestId, render, textOf } from "../diagrams/render-markup";
import { checklist, clubRuleSet, input, lengthReading } from "../scrutineer/fixtures";

// The car card's safety checklist as the server renders it (no browser needed).
// Expiry facts, each from DOMAIN.md's table:
// Source: Motorsport UK NCR 2026 Ch.7 App.6 Arts 3.3–4.1 — extinguisher check date ≤ 2 years old.
// Source: sanctioning-body notice on SFI 38.1 — head restraint recertified 5 years after the sticker month.
const ruleSetInput: RuleSetInput = {
  ...clubRuleSet(),
  safety: {
    expiryWarningDays: 30,
    standards: [
      {
        id: "sfi-38-1",
        name: "SFI 38.1",
        item: "head restraint",
        labelForm: "manufacture-month",
        policy: { kind: "years-from-label-month", years: 5 },
      },
      {
        id: "extinguisher-check",
        name: "Extinguisher check",
        item: "extinguisher",
        labelForm: "date",
        policy: { kind: "years-from-label-date", years: 2 },
      },
    ],
    checklist: [
      {
        id: "head-restraint",
        label: "Head restraint",
        required: false,
        notApplicableAllowed: true,
        equipment: { acceptedStandardIds: ["sfi-38-1"] },
      },
      {
        id: "extinguisher",
        label: "Fire extinguisher",
        equipment: { acceptedStandardIds: ["extinguisher-check"] },
      },
      { id: "battery", label: "Battery secured" },
      // Optional but, in this rule set, never "not applicable": only pass or fail may be offered.
      { id: "tow-strap", label: "Tow strap", required: false },
    ],
  },
};
const ruleSet: RuleSet = ruleSetSchema.parse(ruleSetInput);
const EVENT_DATE = "2026-05-16";

const pack = {
  event: {
    id: "event-1",
    name: "Test day",
    eventDate: EVENT_DATE,
    timeZone: "Europe/London",
    unitSystem: "mm",
    venueName: "Test circuit",
  },
  officials: [{ userId: "scrutineer-a", name: "Sam Reade" }],
  entries: [],
  records: [],
  verdicts: [],
} as unknown as StoredPack;

function withTech(element: ReactElement, rs: RuleSet = ruleSet): string {
  const value: TechContextValue = {
    eventId: "event-1",
    official: { id: "scrutineer-a", name: "Sam Reade" },
    deviceId: "phone-1",
    canWrite: true,
    canChief: false,
    pack,
    ruleSet: rs,
    local: [],
    record: async () => {},
  };
  return render(<TechContext.Provider value={value}>{element}</TechContext.Provider>);
}

function verdictOf(records: TechRecord[], rs: RuleSetInput = ruleSetInput): Verdict {
  return evaluateEntry(
    input({ ruleSet: rs, records, declaredClassId: "club", eventDate: EVENT_DATE }),
  );
}

function itemMarkup(itemId: string, records: TechRecord[], rs: RuleSet = ruleSet): string {
  const verdict = verdictOf(records, rs as RuleSetInput);
  const result = verdict.safety.find((s) => s.itemId === itemId);
  const answer = records.find(
    (r): r is TechRecordOf<"checklist"> => r.kind === "checklist" && r.id === result?.recordId,
  );
  const item = rs.safety.checklist.find((i) => i.id === itemId);
  if (!item) throw new Error(itemId);
  return withTech(
    <ChecklistItemForm entryId="entry-1" item={item} result={result} answer={answer} />,
    rs,
  );
}

const buttons = (markup: string) =>
  [...markup.matchAll(/<button[^>]*aria-pressed="(true|false)"[^>]*>([\s\S]*?)<\/button>/g)].map(
    (m) => ({ name: textOf(m[2] ?? ""), pressed: m[1] === "true" }),
  );

describe("the checklist on the car card", () => {
  it("offers Not fitted only where the rule set accepts not applicable", () => {
    expect(buttons(itemMarkup("head-restraint", [])).map((b) => b.name)).toEqual([
      "Pass",
      "Fail",
      "Not fitted",
    ]);
    expect(buttons(itemMarkup("battery", [])).map((b) => b.name)).toEqual(["Pass", "Fail"]);
    const towStrap = itemMarkup("tow-strap", []);
    expect(buttons(towStrap).map((b) => b.name)).toEqual(["Pass", "Fail"]);
    expect(towStrap).not.toContain("(if fitted)");
  });

  it("shows the recorded answer pressed, and its state in words", () => {
    const failed = itemMarkup("battery", [checklist(1, { itemId: "battery", result: "fail" })]);
    expect(buttons(failed)).toEqual([
      { name: "Pass", pressed: false },
      { name: "Fail", pressed: true },
    ]);
    expect(textOf(partByTestId(failed, "checklist-state"))).toMatch(/^Failed by you · \d\d:\d\d$/);

    const notFitted = itemMarkup("head-restraint", [
      checklist(2, { itemId: "head-restraint", result: "not-applicable" }),
    ]);
    expect(buttons(notFitted).find((b) => b.pressed)?.name).toBe("Not fitted");
    expect(textOf(partByTestId(notFitted, "checklist-state"))).toMatch(/^Not fitted/);
  });

  it("fills the label fields from the latest answer after a reload", () => {
    const markup = itemMarkup("head-restraint", [
      checklist(3, {
        itemId: "head-restraint",
        result: "pass",
        equipment: {
          standardId: "sfi-38-1",
          label: { form: "manufacture-month", year: 2023, month: 3 },
        },
      }),
    ]);
    expect(markup).toMatch(/placeholder="MM" value="3"/);
    expect(markup).toMatch(/placeholder="YYYY" value="2023"/);
    expect(markup).toMatch(/<option value="sfi-38-1" selected="">SFI 38.1<\/option>/);
    expect(buttons(markup).find((b) => b.pressed)?.name).toBe("Pass");
  });

  it("shows equipment expiring within the warning window in the attention state, on the card and in the verdict", () => {
    // Checked 2024-06-01 → valid through 2026-06-01: 16 days after a 2026-05-16 event, inside 30.
    const records = [
      checklist(4, {
        itemId: "extinguisher",
        result: "pass",
        equipment: {
          standardId: "extinguisher-check",
          label: { form: "date", date: "2024-06-01" },
        },
      }),
    ];
    const card = itemMarkup("extinguisher", records);
    expect(card).toMatch(/data-state="attention"/);
    expect(card).toContain("border-attention-line");
    const state = partByTestId(card, "checklist-state");
    expect(textOf(state)).toMatch(/^Passed · expires soon/);
    expect(state).toMatch(/data-tone="attention"/);
    expect(state).toContain("<svg"); // word + icon + colour

    const verdict = withTech(
      <VerdictView verdict={verdictOf(records)} ruleSet={ruleSet} label="Preview" testId="v" />,
    );
    const line = partByTestId(verdict, "verdict-safety-extinguisher");
    expect(line).toMatch(/data-tone="attention"/);
    expect(textOf(line)).toMatch(/expires soon .*expires in 16 days/);
  });

  it("words a too-close-to-call limit in our vocabulary", () => {
    // Test values: limit 8 in = 203.2 mm above the roof (fixture); wing top 1403.2 mm and roof
    // 1200 mm, u = 1 mm each → 203.2 ± 2.8 mm (k = 2): neither clear nor over under guarded
    // acceptance (JCGM 106:2012 §8), so the limit is too close to call.
    const verdict = verdictOf(
      [
        lengthReading(1, "wingTopFromGroundMm", 1403.2),
        lengthReading(2, "roofPeakFromGroundMm", 1200),
      ],
      { ...ruleSetInput, decisionRule: { kind: "guarded", k: 2 } },
    );
    const markup = withTech(
      <VerdictView verdict={verdict} ruleSet={ruleSet} label="Preview" testId="v" />,
    );
    expect(textOf(markup)).toMatch(/too close to call — Wing top/);
    expect(textOf(markup)).not.toMatch(/\bunsure\b/);
  });

  it("labels the phone's verdict a preview on this device, whatever the device", () => {
    const withEntry = {
      ...pack,
      entries: [
        {
          entryId: "entry-1",
          carNumber: 37,
          declaredClassId: "club",
          car: "Test car",
          colour: "grey",
          drivers: "A. Driver",
          declarations: { aero: { wing: true } },
        },
      ],
    } as unknown as StoredPack;
    const value: TechContextValue = {
      eventId: "event-1",
      official: { id: "scrutineer-a", name: "Sam Reade" },
      deviceId: "phone-1",
      canWrite: true,
      canChief: false,
      pack: withEntry,
      ruleSet,
      local: [],
      record: async () => {},
    };
    // The card's photo panel reads through TanStack Query, as in the app's providers.
    const markup = render(
      <QueryClientProvider client={new QueryClient()}>
        <TechContext.Provider value={value}>
          <CarCard entryId="entry-1" onBack={() => {}} />
        </TechContext.Provider>
      </QueryClientProvider>,
    );
    expect(textOf(partByTestId(markup, "preview-verdict"))).toMatch(/^Preview on this device/);
    expect(markup).not.toMatch(/on this phone/i);
  });
});

describe("the demo rule set", () => {
  it("accepts not applicable for every item that may be left out", () => {
    // Our own consistency rule: "(if fitted)" and "Not fitted" must be answers the engine takes.
    const optional = demoRuleSet.safety.checklist.filter((i) => !i.required);
    expect(optional.map((i) => i.id)).toEqual(expect.arrayContaining(["head-restraint", "suit"]));
    for (const item of optional) expect(item.notApplicableAllowed, item.id).toBe(true);
  });

  it("does not keep a car waiting when its head restraint and race suit are not fitted", () => {
    const notFitted = ["head-restraint", "suit"].map((itemId, i) =>
      checklist(10 + i, { itemId, result: "not-applicable" }),
    );
    const verdict = evaluateEntry(
      input({
        ruleSet: demoRuleSet as unknown as RuleSetInput,
        records: notFitted,
        declaredClassId: "kestrel",
        eventDate: EVENT_DATE,
      }),
    );
    for (const id of ["head-restraint", "suit"]) {
      expect(verdict.safety.find((s) => s.itemId === id)?.outcome).toBe("not-applicable");
    }
    expect(verdict.missing.join(" ")).not.toMatch(/head restraint|race suit/i);
  });
});
