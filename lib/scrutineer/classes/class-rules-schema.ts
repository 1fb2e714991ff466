import { z } from "zod";

const lengthMm = z.number().finite();
const optional = <T extends z.ZodType>(schema: T) => schema.nullable().default(null);

/** Wing limits for one class. `null` limits are unlimited in that class. */
export const wingRulesSchema = z.discriminatedUnion("allowed", [
  z.object({ allowed: z.literal(false) }),
  z.object({
    allowed: z.literal(true),
    /** Highest point of the wing, above the roof's highest point or above the ground. */
    height: optional(z.object({ reference: z.enum(["roof-peak", "ground"]), maxMm: lengthMm })),
    /** Rearmost point of the wing behind the rearmost bodywork (signed; 0 = not behind). */
    maxOverhangMm: optional(lengthMm),
    /** Span no wider than the body + allowance; end plates counted unless the rule says not. */
    span: optional(
      z.object({
        allowanceOverBodyMm: lengthMm.default(0),
        endPlatesCounted: z.boolean().default(true),
      }),
    ),
    maxChordMm: optional(lengthMm.positive()),
  }),
]);

/** Splitter limits for one class. */
export const splitterRulesSchema = z.discriminatedUnion("allowed", [
  z.object({ allowed: z.literal(false) }),
  z.object({
    allowed: z.literal(true),
    /** Forward of the bumper's foremost point. */
    maxProtrusionMm: optional(lengthMm),
    /** Splitter width no wider than the body + allowance. */
    width: optional(z.object({ allowanceOverBodyMm: lengthMm.default(0) })),
  }),
]);

/** One class of the ladder. */
export const classRulesSchema = z.object({
  id: z.string().regex(/^[a-z0-9][a-z0-9-]*$/, "Use lower-case letters, digits and hyphens"),
  name: z.string().min(1),
  description: z.string().optional(),
  aero: z.object({
    wing: wingRulesSchema,
    splitter: splitterRulesSchema,
    diffuserAllowed: z.boolean().default(true),
  }),
  /** Minimum mass per power, in the rule set's power-to-weight unit (a car below it is too quick). */
  minPowerToWeight: optional(z.number().positive()),
  /** Minimum UTQG treadwear; a tyre without a grade fails any floor. */
  minTreadwear: optional(z.number().int().min(0)),
  maxModificationPoints: optional(z.number().min(0)),
  /** Displacement limit after the forced-induction multiplier. */
  maxEffectiveDisplacementCc: optional(z.number().positive()),
});
/** A class as stored; see {@link classRulesSchema}. */
export type ClassRules = z.infer<typeof classRulesSchema>;
