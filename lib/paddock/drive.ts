import { z } from "zod";

/** Driving experience an entrant declares for each driver, lowest first. HPDE-style run groups sort
 *  drivers into these bands (common practice (no source)). */
export const experienceLevels = ["novice", "intermediate", "advanced", "expert"] as const;
export type ExperienceLevel = (typeof experienceLevels)[number];

/**
 * One drive: a car with one of its drivers. A shared car (two drivers) gives two drives, which must
 * never share a run group. `carKey` and `driverKey` name the physical car and the person, so a
 * driver entered in two cars is caught too.
 */
export const driveSchema = z.object({
  /** `${entryId}:1` for the entry's driver, `${entryId}:2` for its co-driver. */
  driveId: z.string().min(1).max(80),
  entryId: z.string().min(1).max(64),
  carNumber: z.number().int().min(0).max(9999),
  carKey: z.string().min(1).max(64),
  driverKey: z.string().min(1).max(255),
  driverName: z.string().max(255),
  /** The class the car runs in today (after any move-up), its place on the ladder (0 = lowest). */
  classId: z.string().min(1).max(40),
  className: z.string().max(120),
  classRank: z.number().int().min(0),
  experience: z.enum(experienceLevels),
  /** The driver's own lap-time estimate for this venue, in milliseconds; null when not given. */
  lapTimeMs: z.number().int().positive().nullable(),
});
export type Drive = z.infer<typeof driveSchema>;

/** The drive id of an entry's driver (slot 1) or co-driver (slot 2). */
export function driveIdOf(entryId: string, slot: 1 | 2): string {
  return `${entryId}:${slot}`;
}
