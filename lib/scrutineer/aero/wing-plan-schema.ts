import { z } from "zod";
import { convertLength } from "../units/convert-length";

/** The units a plan's lengths may be typed in; each field keeps its own for display. */
export const PLAN_LENGTH_UNITS = ["mm", "in"] as const;
/** A plan's length unit. */
export type PlanLengthUnit = (typeof PLAN_LENGTH_UNITS)[number];

/** Largest length a plan takes, in mm (10 m: longer than any car). */
export const PLAN_MAX_LENGTH_MM = 10_000;

/** One length of a plan: the number as typed and its unit. Not negative; at most 10 m. */
export const planLengthSchema = z
  .object({
    value: z.number().finite().min(0, "Cannot be negative"),
    unit: z.enum(PLAN_LENGTH_UNITS),
  })
  .refine((l) => convertLength(l.value, l.unit, "mm") <= PLAN_MAX_LENGTH_MM, {
    message: "Longer than any car; check the number and unit",
  });
/** See {@link planLengthSchema}. */
export type PlanLength = z.infer<typeof planLengthSchema>;

/** A plan's length in millimetres. */
export function planLengthMm(length: PlanLength): number {
  return convertLength(length.value, length.unit, "mm");
}

const positive = planLengthSchema.refine((l) => l.value > 0, { message: "Must be more than 0" });

/**
 * An entrant's wing, planned before it is built, on their car. Lengths are kept as typed (number
 * and unit per field) so the answers come back in the same units.
 * - car: body width at its widest (mirrors excluded), roof's highest point from the ground, and
 *   how far the rearmost bodywork sits behind the rear axle's centre line (kept with the plan for
 *   the builder's reference; no limit uses it: overhang is measured from the bodywork itself).
 * - wing.span: the span between the end plates' outer faces, or its parts: two equal halves and
 *   two end plates (span = 2 × half + 2 × end plate, end plates counted).
 * - wing.endPlate: each end plate's thickness (rules that do not count end plates take both off).
 * - wing.height: the wing's highest point from the ground.
 * - wing.mount: how far the wing's rearmost point (the trailing edge) sits behind or ahead of
 *   the rearmost bodywork.
 */
export const wingPlanSchema = z.object({
  car: z.object({
    bodyWidth: positive,
    roofHeight: positive,
    rearmostBodywork: planLengthSchema,
  }),
  wing: z.object({
    span: z.discriminatedUnion("kind", [
      z.object({ kind: z.literal("whole"), span: positive }),
      z.object({ kind: z.literal("parts"), half: positive }),
    ]),
    endPlate: planLengthSchema,
    chord: positive,
    height: positive,
    mount: z.object({
      distance: planLengthSchema,
      direction: z.enum(["behind", "ahead"]),
    }),
  }),
});
/** See {@link wingPlanSchema}. */
export type WingPlan = z.infer<typeof wingPlanSchema>;
