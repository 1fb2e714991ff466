import { z } from "zod";

/** The event's display units. Mass follows length unless stated (mm → kg, in → lb). */
export const displayUnitsSchema = z
  .object({ length: z.enum(["mm", "in"]), mass: z.enum(["kg", "lb"]).optional() })
  .transform((d) => ({ length: d.length, mass: d.mass ?? (d.length === "mm" ? "kg" : "lb") }));
/** Display units after defaults. */
export type DisplayUnits = z.output<typeof displayUnitsSchema>;
/** Display units as sent. */
export type DisplayUnitsInput = z.input<typeof displayUnitsSchema>;

/** Display units from what was sent, filling the mass unit from the length unit. */
export function displayUnits(input: DisplayUnitsInput): DisplayUnits {
  return displayUnitsSchema.parse(input);
}
