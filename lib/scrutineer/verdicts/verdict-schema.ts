import { z } from "zod";
import { CORNERS, LENGTH_DIMENSIONS } from "../records/record-schema";
import { CLASS_RULE_IDS, EVENT_RULE_IDS } from "../rule-sets/rule-ids";
import { POWER_TO_WEIGHT_UNITS } from "../units/convert-power-to-weight";

/** Verdict states, in Plumbline's words. */
export const VERDICT_STATUSES = ["waiting", "cleared", "moved-up", "re-measure", "held"] as const;
/** One of {@link VERDICT_STATUSES}. */
export type VerdictStatus = (typeof VERDICT_STATUSES)[number];

/** Marks a verdict carries besides its status. */
export const VERDICT_FLAGS = [
  "disagreement",
  "inconclusive",
  "overridden",
  "expires-soon",
  "conditions-mismatch",
  "foreign-record",
  "duplicate-record",
  "void-cycle",
  "override-invalid",
  "unknown-checklist-item",
  "implausible-reading",
  "not-computed",
  "reinspection",
] as const;
/** One of {@link VERDICT_FLAGS}. */
export type VerdictFlag = (typeof VERDICT_FLAGS)[number];

/** Units a rule result's numbers are in (lengths always mm; the reason uses the event's unit). */
export const RULE_UNITS = [
  "mm",
  "dB(A)",
  "points",
  "treadwear",
  "cc",
  "none",
  ...POWER_TO_WEIGHT_UNITS,
] as const;
/** One of {@link RULE_UNITS}. */
export type RuleUnit = (typeof RULE_UNITS)[number];

const dimension = z.enum([...LENGTH_DIMENSIONS, "cornerWeightKg", "noiseDbA"]);

/** One dimension's combined reading, as used by a rule. */
export const measurandPartSchema = z.object({
  dimension,
  corner: z.enum(CORNERS).nullable(),
  value: z.number(),
  standardUncertainty: z.number(),
  n: z.number().int(),
});
/** See {@link measurandPartSchema}. */
export type MeasurandPart = z.infer<typeof measurandPartSchema>;

/** The result of one rule for one class (or for the event). */
export const ruleResultSchema = z.object({
  ruleId: z.enum([...CLASS_RULE_IDS, ...EVENT_RULE_IDS]),
  /** null for event rules (noise). */
  classId: z.string().nullable(),
  unit: z.enum(RULE_UNITS),
  /** The measurand: value, u and U = k·u, and the dimensions it came from. */
  reading: z
    .object({
      value: z.number(),
      standardUncertainty: z.number(),
      expandedUncertainty: z.number(),
      parts: z.array(measurandPartSchema),
    })
    .nullable(),
  limit: z.object({ value: z.number(), side: z.enum(["max", "min"]) }).nullable(),
  /** Positive = inside the limit, negative = beyond it; in `unit`. */
  marginToLimit: z.number().nullable(),
  /** simple/guarded for measurements, declared for entrant declarations, presence for allowed/not. */
  decisionRule: z.enum(["simple", "guarded", "declared", "presence"]),
  coverageFactorK: z.number().nullable(),
  conformanceProbability: z.number().nullable(),
  outcome: z.enum(["pass", "fail", "inconclusive", "waiting", "not-applicable"]),
  onFail: z.enum(["move-up", "stop"]),
  /** What is still needed before the rule can be decided. */
  missing: z.array(z.string()),
  /** Short margin text for drawings, in the event's unit ("over by 2 mm"). */
  marginText: z.string().nullable(),
  /** One line a scrutineer can read aloud. */
  reason: z.string(),
});
/** See {@link ruleResultSchema}. */
export type RuleResult = z.infer<typeof ruleResultSchema>;

/** Every class rule checked for one class of the ladder. */
export const classCheckSchema = z.object({
  classId: z.string(),
  className: z.string(),
  fit: z.enum(["fits", "over", "unsure", "incomplete"]),
  rules: z.array(ruleResultSchema),
});
/** See {@link classCheckSchema}. */
export type ClassCheck = z.infer<typeof classCheckSchema>;

/** One checklist item on the event date. */
export const safetyItemResultSchema = z.object({
  itemId: z.string(),
  label: z.string(),
  required: z.boolean(),
  outcome: z.enum(["pass", "fail", "waiting", "not-applicable"]),
  recordId: z.string().nullable(),
  equipment: z
    .object({
      standardId: z.string(),
      standardName: z.string().nullable(),
      validThrough: z.iso.date().nullable(),
      status: z.enum(["valid", "expires-soon", "expired", "not-accepted", "unreadable"]),
      daysLeft: z.number().int().nullable(),
    })
    .nullable(),
  /** What is still needed before the item can be decided ("re-read the harness label"). */
  missing: z.array(z.string()),
  reason: z.string(),
});
/** See {@link safetyItemResultSchema}. */
export type SafetyItemResult = z.infer<typeof safetyItemResultSchema>;

/** One official's readings of a dimension, combined (mean, u_c from Type A and Type B). */
export const officialValueSchema = z.object({
  officialId: z.string(),
  recordIds: z.array(z.string()),
  n: z.number().int(),
  mean: z.number(),
  combinedStandardUncertainty: z.number(),
});

/** The combined readings of one dimension (one corner for corner weights). */
export const dimensionSummarySchema = z.object({
  dimension,
  corner: z.enum(CORNERS).nullable(),
  n: z.number().int(),
  mean: z.number(),
  experimentalStandardDeviation: z.number().nullable(),
  typeAStandardUncertainty: z.number(),
  typeBStandardUncertainty: z.number(),
  combinedStandardUncertainty: z.number(),
  expandedUncertainty: z.number(),
  k: z.number(),
  readingIds: z.array(z.string()),
  /** Pairs of officials whose values (each official's readings combined) differ by more than
   * k·√(u₁² + u₂²). */
  disagreements: z.array(
    z.object({
      first: officialValueSchema,
      second: officialValueSchema,
      difference: z.number(),
      allowedDifference: z.number(),
    }),
  ),
});
/** See {@link dimensionSummarySchema}. */
export type DimensionSummary = z.infer<typeof dimensionSummarySchema>;

/** What `evaluateEntry` returns. Plain JSON. */
export const verdictSchema = z.object({
  entryId: z.string(),
  ruleSetId: z.string(),
  ruleSetVersion: z.number().int(),
  eventDate: z.iso.date(),
  declaredClassId: z.string(),
  status: z.enum(VERDICT_STATUSES),
  /** The class the car runs in (cleared, moved-up), or the class still being settled (waiting,
   * re-measure); null when held. */
  classId: z.string().nullable(),
  /** For re-measure: the class the car would move up to if the doubtful reading proves over. */
  fallbackClassId: z.string().nullable(),
  reason: z.string(),
  flags: z.array(z.enum(VERDICT_FLAGS)),
  override: z
    .object({
      recordId: z.string(),
      officialId: z.string(),
      deviceTime: z.string(),
      reason: z.string(),
      computedStatus: z.enum(VERDICT_STATUSES),
      computedClassId: z.string().nullable(),
      computedReason: z.string(),
    })
    .nullable(),
  /** The latest override when it does not fit the rule set or the declared class: it is ignored
   * (the computed verdict stands, flagged "override-invalid") and this says why. Absent in
   * verdicts stored before it existed. */
  rejectedOverride: z
    .object({
      recordId: z.string(),
      officialId: z.string(),
      deviceTime: z.string(),
      status: z.enum(["cleared", "moved-up", "held"]),
      classId: z.string().nullable(),
      problem: z.string(),
    })
    .nullable()
    .default(null),
  /** An open re-inspection (after an incident or a protest): the car waits until the chief
   *  scrutineer closes it; what the records alone say stays in `computedStatus`. */
  reinspection: z
    .object({
      cause: z.enum(["incident", "protest", "other"]),
      askedBy: z.string(),
      askedAt: z.string(),
      reason: z.string(),
      computedStatus: z.enum(VERDICT_STATUSES),
      computedClassId: z.string().nullable(),
      computedReason: z.string(),
    })
    .nullable()
    .default(null),
  classChecks: z.array(classCheckSchema),
  eventRules: z.array(ruleResultSchema),
  safety: z.array(safetyItemResultSchema),
  dimensions: z.array(dimensionSummarySchema),
  /** Readings not used because they were taken outside the rule set's measurement conditions. */
  setAside: z.array(
    z.object({
      recordId: z.string(),
      dimension,
      corner: z.enum(CORNERS).nullable(),
      why: z.string(),
    }),
  ),
  missing: z.array(z.string()),
  /** Readings outside what a car can measure, kept as saved and marked for the chief scrutineer,
   * each with why in words. Absent in verdicts stored before it existed. */
  implausibleReadings: z
    .array(
      z.object({
        recordId: z.string(),
        dimension,
        corner: z.enum(CORNERS).nullable(),
        why: z.string(),
      }),
    )
    .default([]),
  records: z.object({
    total: z.number().int(),
    used: z.number().int(),
    voided: z.number().int(),
    ignored: z.number().int(),
  }),
  display: z.object({ length: z.enum(["mm", "in"]), mass: z.enum(["kg", "lb"]) }),
  /** Always shown with the verdict: it is computed, the chief scrutineer has the final say. */
  notice: z.string(),
});
/** See {@link verdictSchema}. */
export type Verdict = z.infer<typeof verdictSchema>;
