import { z } from "zod";

/** What the clerk of course marks on a session during the day, in order of a session's life.
 *  "red-flag" stops a session on track (it may go "on-track" again); "cut-short" ends it early. */
export const sessionCallStates = [
  "called",
  "on-track",
  "red-flag",
  "finished",
  "cut-short",
] as const;
export type SessionCallState = (typeof sessionCallStates)[number];

/** One mark, stored append-only; the latest mark of a session is its state. */
export const sessionCallSchema = z.object({
  /** The session's key in the published schedule: `${round}-${groupIndex}` (both from 1). */
  sessionKey: z.string().regex(/^\d{1,2}-\d{1,2}$/),
  state: z.enum(sessionCallStates),
  /** When it happened (UTC ISO instant). */
  at: z.iso.datetime(),
  note: z.string().max(500).nullable(),
});
export type SessionCall = z.infer<typeof sessionCallSchema>;
