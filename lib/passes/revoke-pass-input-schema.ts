import { z } from "zod";

/** What the organizer sends to revoke a scanned pass. */
export const revokePassInputSchema = z.object({
  token: z.string().min(1).max(4096),
  reason: z
    .string()
    .trim()
    .min(3, "Say why the pass is revoked (at least 3 characters)")
    .max(300, "Keep the reason under 300 characters"),
});

export type RevokePassInput = z.infer<typeof revokePassInputSchema>;
