import { z } from "zod";

/** Re-derive the verdicts of some entries of an event after records arrived. */
export const RECOMPUTE_VERDICTS = "recompute-verdicts";
/** Send one e-mail (already composed) to one person. */
export const SEND_MAIL = "send-mail";

export const recomputeVerdictsPayload = z.object({
  eventId: z.string(),
  entryIds: z.array(z.string()),
});

export const sendMailPayload = z.object({
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  kind: z.string(),
  eventId: z.string().nullable().optional(),
  /** Made when the mail is queued, so every attempt (and a restored backup's new jobs) carries
   *  its own Message-ID, the same on each try. */
  messageId: z.string().optional(),
  /** Small files sent with the mail (an iCalendar file of the entrant's sessions). */
  attachments: z
    .array(
      z.object({
        filename: z.string().max(120),
        contentType: z.string().max(120),
        content: z.string().max(200_000),
      }),
    )
    .max(3)
    .optional(),
});

export type SendMailPayload = z.infer<typeof sendMailPayload>;
