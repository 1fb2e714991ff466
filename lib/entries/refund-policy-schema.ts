import { z } from "zod";

/**
 * What an entrant gets back on withdrawing, as the organizer sets it: each tier gives a
 * percentage of the fee paid to a withdrawal made at least `daysBefore` whole days before the
 * event's date (at the venue); the first tier that applies wins; none = nothing back.
 * Example: [{14, 100}, {3, 50}] — in full up to two weeks before, half up to three days before.
 */
export const refundPolicySchema = z.object({
  tiers: z
    .array(
      z.object({
        daysBefore: z.number().int().min(0).max(365),
        percent: z.number().int().min(0).max(100),
      }),
    )
    .max(6),
});

export type RefundPolicy = z.infer<typeof refundPolicySchema>;
