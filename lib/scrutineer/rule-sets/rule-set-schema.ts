import { z } from "zod";
import { classRulesSchema } from "../classes/class-rules-schema";
import { LENGTH_DIMENSIONS } from "../records/record-schema";
import { POLICY_LABEL_FORMS, safetyRulesSchema } from "../safety/safety-rules-schema";
import { POWER_TO_WEIGHT_UNITS } from "../units/convert-power-to-weight";
import { CLASS_RULE_IDS } from "./rule-ids";

/** Dyno correction standards a rule set can require; "uncorrected" means observed power. */
export const CORRECTION_STANDARDS = ["sae-j1349", "std", "uncorrected"] as const;

/**
 * How a reading is judged against a limit (JCGM 106:2012 §8). Both carry the coverage factor k
 * used for the expanded uncertainty U = k·u that verdicts report and disagreements use.
 */
export const decisionRuleSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("simple"), k: z.number().positive().default(2) }),
  z.object({ kind: z.literal("guarded"), k: z.number().positive() }),
]);
/** See {@link decisionRuleSchema}. */
export type DecisionRule = z.infer<typeof decisionRuleSchema>;

const conditionsSchema = z.object({
  driverAboard: z.boolean(),
  levelPad: z.boolean().default(true),
  tyrePressureKpa: z
    .object({ min: z.number().positive(), max: z.number().positive() })
    .nullable()
    .default(null),
  notes: z.string().optional(),
});

/** The dimensions a reading can carry, for per-dimension data in a rule set. */
const READING_DIMENSIONS = [...LENGTH_DIMENSIONS, "cornerWeightKg", "noiseDbA"] as const;

/**
 * What a reading of each dimension can plausibly be on a car at the tech line, in the
 * dimension's unit (mm, kg, dB(A)), with where the range comes from. A reading outside it is
 * kept as saved but marked for the chief scrutineer (`implausibleReading`). Optional: rule sets
 * stored before it existed stay valid, and where a dimension has no range only the hard caps of
 * `reading-limits.ts` apply.
 */
export const plausibleReadingsSchema = z
  .partialRecord(
    z.enum(READING_DIMENSIONS),
    z
      .object({ min: z.number().finite(), max: z.number().finite(), source: z.string().optional() })
      .refine((r) => r.min < r.max, {
        message: "The lowest plausible value is not below the highest",
      }),
  )
  .optional();

const powerToWeightSchema = z.object({
  unit: z.enum(POWER_TO_WEIGHT_UNITS),
  weightBasis: z.enum(["with-driver", "without-driver"]),
  /** When the weighing condition differs from the basis: the declared driver or a fixed mass. */
  driverMass: z.discriminatedUnion("kind", [
    z.object({ kind: z.literal("declared") }),
    z.object({ kind: z.literal("fixed"), kg: z.number().positive() }),
  ]),
  /** Whether declared ballast (on the scales) counts toward the class weight. */
  ballastCounts: z.boolean().default(true),
  powerMeasuredAt: z.enum(["wheel", "crank"]),
  /** Optional: wheel power = crank power × factor, when the rule allows converting. */
  crankToWheelFactor: z.number().gt(0).lte(1).nullable().default(null),
  correction: z.enum(CORRECTION_STANDARDS),
  /** A dyno sheet older than this on the event date is not accepted. */
  dynoSheetValidYears: z.number().int().positive().nullable().default(null),
});

/**
 * A versioned rule set: the class ladder (low → high) and every limit, reference point and
 * expiry rule the engine applies. Stored as JSON by the organizer; validated on save.
 */
export const ruleSetSchema = z
  .object({
    schemaVersion: z.literal(1),
    id: z.string().min(1),
    version: z.number().int().positive(),
    name: z.string().min(1),
    sanctioningBody: z.string().optional(),
    notes: z.string().optional(),
    /** Ordered from the most restricted class to the least. */
    classes: z.array(classRulesSchema).min(1),
    decisionRule: decisionRuleSchema,
    measurement: z.object({
      aero: conditionsSchema,
      weighing: conditionsSchema,
      /** Where each reading is taken from, as the rulebook words it (shown on the car card). */
      references: z.object({
        roofPeak: z.string().min(1),
        rearmostBodywork: z.string().min(1),
        bodyWidth: z.string().min(1),
        splitterFront: z.string().min(1),
      }),
      plausible: plausibleReadingsSchema,
    }),
    /** Which class-rule failures move a car up and which stop it; unlisted rules move up. */
    onViolation: z.partialRecord(z.enum(CLASS_RULE_IDS), z.enum(["move-up", "stop"])).default({}),
    powerToWeight: powerToWeightSchema.nullable().default(null),
    /** Effective displacement = displacement × this when forced induction is declared. */
    forcedInductionMultiplier: z.number().min(1).nullable().default(null),
    noise: z
      .object({ maxDbA: z.number().positive(), method: z.string().min(1) })
      .nullable()
      .default(null),
    safety: safetyRulesSchema,
  })
  .superRefine((rs, ctx) => {
    const seen = new Set<string>();
    rs.classes.forEach((c, i) => {
      if (seen.has(c.id)) {
        ctx.addIssue({
          code: "custom",
          path: ["classes", i, "id"],
          message: `Class id "${c.id}" is used twice`,
        });
      }
      seen.add(c.id);
    });
    const standards = new Set<string>();
    rs.safety.standards.forEach((s, i) => {
      if (standards.has(s.id)) {
        ctx.addIssue({
          code: "custom",
          path: ["safety", "standards", i, "id"],
          message: `Standard id "${s.id}" is used twice`,
        });
      }
      standards.add(s.id);
      if (!POLICY_LABEL_FORMS[s.policy.kind].includes(s.labelForm)) {
        ctx.addIssue({
          code: "custom",
          path: ["safety", "standards", i, "policy"],
          message: `Policy "${s.policy.kind}" cannot read a "${s.labelForm}" label`,
        });
      }
    });
    const items = new Set<string>();
    rs.safety.checklist.forEach((item, i) => {
      if (items.has(item.id)) {
        ctx.addIssue({
          code: "custom",
          path: ["safety", "checklist", i, "id"],
          message: `Checklist id "${item.id}" is used twice`,
        });
      }
      items.add(item.id);
      item.equipment?.acceptedStandardIds.forEach((sid, j) => {
        if (!standards.has(sid)) {
          ctx.addIssue({
            code: "custom",
            path: ["safety", "checklist", i, "equipment", "acceptedStandardIds", j],
            message: `Unknown standard "${sid}"`,
          });
        }
      });
    });
    for (const key of ["aero", "weighing"] as const) {
      const p = rs.measurement[key].tyrePressureKpa;
      if (p && p.min > p.max) {
        ctx.addIssue({
          code: "custom",
          path: ["measurement", key, "tyrePressureKpa"],
          message: "The lowest tyre pressure is above the highest",
        });
      }
    }
    const needsPtw = rs.classes.some((c) => c.minPowerToWeight !== null);
    if (needsPtw && rs.powerToWeight === null) {
      ctx.addIssue({
        code: "custom",
        path: ["powerToWeight"],
        message: "A class sets a power-to-weight minimum; say how it is measured",
      });
    }
    const needsFi = rs.classes.some((c) => c.maxEffectiveDisplacementCc !== null);
    if (needsFi && rs.forcedInductionMultiplier === null) {
      ctx.addIssue({
        code: "custom",
        path: ["forcedInductionMultiplier"],
        message: "A class limits displacement; give the forced-induction multiplier (1 for none)",
      });
    }
  });

/** A validated rule set (defaults filled in). */
export type RuleSet = z.output<typeof ruleSetSchema>;
/** A rule set as written by an organizer, before defaults. */
export type RuleSetInput = z.input<typeof ruleSetSchema>;
