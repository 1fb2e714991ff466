import { z } from "zod";
import { scheduledSessionSchema } from "./scheduled-session";
import { sessionCallStates } from "./session-call";

/**
 * A planned session as the day is going: its state from the clerk of course's latest mark and the
 * times it is now expected to run, after the delays ahead of it (see applySessionCalls).
 */
export const liveSessionSchema = scheduledSessionSchema.extend({
  /** "planned" until the clerk marks it; then the latest mark. */
  state: z.enum(["planned", ...sessionCallStates]),
  /** When it starts (or started, once it went on track), UTC ISO instant. */
  expectedStartsAt: z.iso.datetime(),
  /** When it ends (or ended, once finished or cut short), UTC ISO instant. */
  expectedEndsAt: z.iso.datetime(),
  /** The latest note the clerk wrote on it (a red flag's reason, why it was cut short). */
  note: z.string().nullable(),
  /** Expected start minus planned start, in whole minutes; below 0 only when it went out early. */
  shiftedMinutes: z.number().int(),
});
export type LiveSession = z.infer<typeof liveSessionSchema>;
