import fc from "fast-check";
import type { EntryDeclarationsInput } from "@/lib/scrutineer/classes/entry-declarations-schema";
import type {
  LengthDimension,
  ReadingPayload,
  TechRecord,
} from "@/lib/scrutineer/records/record-schema";
import type { RuleSetInput } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import type { EvaluateEntryInput } from "@/lib/scrutineer/verdicts/evaluate-entry-input-schema";
import { evaluateEntryInputSchema } from "@/lib/scrutineer/verdicts/evaluate-entry-input-schema";

/** A deterministic, well-formed UUID v7 for test record n (time-ordered by n). */
export function uuid7(n: number): string {
  const hex = n.toString(16).padStart(12, "0");
  return `01960000-0000-7000-8000-${hex}`;
}

const base = (n: number, minute = n) => ({
  id: uuid7(n),
  entryId: "entry-1",
  officialId: "scrutineer-a",
  deviceId: "phone-1",
  deviceTime: `2026-05-16T09:${String(minute % 60).padStart(2, "0")}:00+01:00`,
});

/** A tape measure with a stated standard uncertainty of 1 mm (test value, not a trade claim). */
export const TAPE = { id: "tape-1", name: "Steel tape", standardUncertainty: 1 };

/** A reading record. */
export function reading(n: number, payload: ReadingPayload): TechRecord {
  return { ...base(n), kind: "reading", payload };
}

/** A length reading record with the tape. */
export function lengthReading(
  n: number,
  dimension: LengthDimension,
  valueMm: number,
  standardUncertaintyMm = 1,
): TechRecord {
  return reading(n, {
    dimension,
    value: valueMm,
    instrument: { ...TAPE, standardUncertainty: standardUncertaintyMm },
  });
}

/** The same record as taken by another official (a second scrutineer at the car). */
export function byOfficial(record: TechRecord, officialId: string): TechRecord {
  return { ...record, officialId };
}

/** A note record: the car was at the tech line, nothing measured. */
export function note(n: number, text = "at the tech line"): TechRecord {
  return { ...base(n), kind: "note", payload: { text } };
}

/** A checklist record. */
export function checklist(
  n: number,
  payload: Extract<TechRecord, { kind: "checklist" }>["payload"],
  minute = n,
): TechRecord {
  return { ...base(n, minute), kind: "checklist", payload };
}

/** A void record. */
export function voidRecord(n: number, target: number, reason = "wrong car"): TechRecord {
  return { ...base(n), kind: "void", payload: { targetRecordId: uuid7(target), reason } };
}

/** An override record by the chief scrutineer. */
export function override(
  n: number,
  payload: Extract<TechRecord, { kind: "override" }>["payload"],
): TechRecord {
  return { ...base(n), officialId: "chief-1", kind: "override", payload };
}

/**
 * A one-class-up ladder around one club rule: span no wider than the body, no more than 5 in
 * behind the rearmost part of the car, no more than 8 in above the roof; over → moves up.
 * Source: common practice (no source) — a club rule as practised; 5 in = 127 mm, 8 in = 203.2 mm
 * (NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly).
 */
export function clubRuleSet(
  decisionRule: RuleSetInput["decisionRule"] = { kind: "simple" },
): RuleSetInput {
  return {
    schemaVersion: 1,
    id: "club-rule",
    version: 1,
    name: "Club rule fixture",
    classes: [
      {
        id: "club",
        name: "Club",
        aero: {
          wing: {
            allowed: true,
            height: { reference: "roof-peak", maxMm: 8 * 25.4 },
            maxOverhangMm: 5 * 25.4,
            span: { allowanceOverBodyMm: 0, endPlatesCounted: true },
            maxChordMm: null,
          },
          splitter: { allowed: true, maxProtrusionMm: null, width: null },
        },
      },
      {
        id: "open",
        name: "Open",
        aero: {
          wing: { allowed: true, height: null, maxOverhangMm: null, span: null, maxChordMm: null },
          splitter: { allowed: true, maxProtrusionMm: null, width: null },
        },
      },
    ],
    decisionRule,
    measurement: {
      aero: { driverAboard: false },
      weighing: { driverAboard: false },
      references: {
        roofPeak: "roof's highest point",
        rearmostBodywork: "rearmost part of the car",
        bodyWidth: "body at its widest, mirrors excluded",
        splitterFront: "bumper's foremost point",
      },
    },
    safety: { standards: [], checklist: [] },
  };
}

/** Parses a full evaluateEntry input (so fixtures go through the same schema as the script). */
export function input(args: {
  ruleSet: RuleSetInput;
  records: TechRecord[];
  declaredClassId: string;
  declarations?: EntryDeclarationsInput;
  eventDate?: string;
  length?: "mm" | "in";
}): EvaluateEntryInput {
  return evaluateEntryInputSchema.parse({
    ruleSet: args.ruleSet,
    entry: {
      entryId: "entry-1",
      declaredClassId: args.declaredClassId,
      declarations: args.declarations ?? { aero: { wing: true } },
    },
    records: args.records,
    eventDate: args.eventDate ?? "2026-05-16",
    display: { length: args.length ?? "mm" },
  });
}

/**
 * Decimals spread across [min, max] at a 1e-4 step. fast-check's `double` favours 0, the bounds
 * and tiny values, which leaves the middle of a range (where limits sit) nearly untested.
 */
export function spread(min: number, max: number): fc.Arbitrary<number> {
  return fc.integer({ min: Math.round(min * 1e4), max: Math.round(max * 1e4) }).map((n) => n / 1e4);
}
