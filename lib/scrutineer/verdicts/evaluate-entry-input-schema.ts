import { z } from "zod";
import { entryDeclarationsSchema } from "../classes/entry-declarations-schema";
import { recordSchema } from "../records/record-schema";
import { ruleSetSchema } from "../rule-sets/rule-set-schema";
import { displayUnitsSchema } from "../units/display-units";

/** The entry as the engine needs it. */
export const entryInputSchema = z.object({
  entryId: z.string().min(1),
  declaredClassId: z.string().min(1),
  declarations: entryDeclarationsSchema,
});

/**
 * Everything `evaluateEntry` takes, as plain JSON: the event's pinned rule set, the entry and its
 * declarations, ALL records of the entry (voids and overrides included), the event's local date
 * and the display units.
 */
export const evaluateEntryInputSchema = z
  .object({
    ruleSet: ruleSetSchema,
    entry: entryInputSchema,
    records: z.array(recordSchema),
    /** The event's calendar date in the venue's time zone (see localDateInZone). */
    eventDate: z.iso.date(),
    display: displayUnitsSchema.prefault({ length: "mm" }),
  })
  .superRefine((input, ctx) => {
    if (!input.ruleSet.classes.some((c) => c.id === input.entry.declaredClassId)) {
      ctx.addIssue({
        code: "custom",
        path: ["entry", "declaredClassId"],
        message: `Class "${input.entry.declaredClassId}" is not in rule set ${input.ruleSet.id} v${input.ruleSet.version}`,
      });
    }
  });
/** Validated input, defaults filled in. */
export type EvaluateEntryInput = z.output<typeof evaluateEntryInputSchema>;
/** Input as sent, before defaults. */
export type EvaluateEntryInputRaw = z.input<typeof evaluateEntryInputSchema>;
