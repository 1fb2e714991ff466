import { z } from "zod";

/** One planned session of a group in one round, as UTC instants (shown in the event's zone). */
export const scheduledSessionSchema = z.object({
  key: z.string().regex(/^\d{1,2}-\d{1,2}$/),
  round: z.number().int().min(1),
  /** Index into the run sheet's groups, from 1 (the rotation's order). */
  groupIndex: z.number().int().min(1),
  startsAt: z.iso.datetime(),
  endsAt: z.iso.datetime(),
});
export type ScheduledSession = z.infer<typeof scheduledSessionSchema>;

/** A fixed block of the day that is not a session: the drivers' briefing or the lunch break. */
export const dayBlockSchema = z.object({
  kind: z.enum(["briefing", "lunch"]),
  startsAt: z.iso.datetime(),
  endsAt: z.iso.datetime(),
});
export type DayBlock = z.infer<typeof dayBlockSchema>;
