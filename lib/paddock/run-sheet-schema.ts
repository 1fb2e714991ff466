import { z } from "zod";
import { driveSchema } from "./drive";
import { runGroupsSchema } from "./run-group-plan";
import { scheduleSettingsSchema } from "./schedule-settings";
import { dayBlockSchema, scheduledSessionSchema } from "./scheduled-session";

/**
 * The body of one published run sheet: an immutable snapshot of who runs in which group and when.
 * Stored as JSON in `run_group_publications.body`; a later publication is a new version, and the
 * difference between two versions is computed from their bodies alone.
 */
export const runSheetSchema = z.object({
  timeZone: z.string().min(1).max(64),
  /** The event's calendar date at the venue (YYYY-MM-DD). */
  eventDate: z.iso.date(),
  drives: z.array(driveSchema).max(2000),
  groups: runGroupsSchema,
  settings: scheduleSettingsSchema,
  sessions: z.array(scheduledSessionSchema).max(2000),
  blocks: z.array(dayBlockSchema).max(10),
  /** Why each drive sits where it does, in words (keyed by drive id). */
  explanations: z.record(z.string(), z.string().max(1000)),
  /** Constraints that could not all be met, and for whom. */
  gaveWay: z
    .array(
      z.object({
        rule: z.string().max(60),
        driveIds: z.array(z.string()),
        text: z.string().max(1000),
      }),
    )
    .max(500),
  /** Cars per group the day allows, and where that number came from ("12 cars: set by the organizer"). */
  cap: z.object({ cars: z.number().int().min(1), source: z.string().max(300) }),
});
export type RunSheet = z.infer<typeof runSheetSchema>;

/** A run sheet as stored: its version, when and by whom it was published. */
export type RunSheetPublication = {
  id: string;
  eventId: string;
  version: number;
  publishedAt: string;
  publishedBy: string;
  body: RunSheet;
};
