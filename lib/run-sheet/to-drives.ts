import { type Drive, driveIdOf, type ExperienceLevel } from "../paddock/drive";

/** An entry as the run groups need it (from listEventEntries), already known to be ready. */
export type DriveSource = {
  entryId: string;
  carNumber: number;
  carId: string;
  driverId: string;
  driverName: string | null;
  driverExperience: ExperienceLevel | null;
  lapTimeEstimateMs: number | null;
  coDriverId: string | null;
  coDriverName: string | null;
  coDriverExperience: ExperienceLevel | null;
  coDriverLapTimeEstimateMs: number | null;
  /** The class it runs in today (after a move-up), and its place on the ladder (0 = lowest). */
  classId: string;
  className: string;
  classRank: number;
};

/**
 * The drives of ready entries: one per driver, so a shared car gives two. A driver who did not say
 * their experience runs as a novice (the careful choice: common practice (no source)); a
 * co-driver without their own lap estimate has none (the car's estimate is the driver's).
 */
export function toDrives(sources: DriveSource[]): Drive[] {
  return sources.flatMap((s) => {
    const base = {
      entryId: s.entryId,
      carNumber: s.carNumber,
      carKey: s.carId,
      classId: s.classId,
      className: s.className,
      classRank: s.classRank,
    };
    const drives: Drive[] = [
      {
        ...base,
        driveId: driveIdOf(s.entryId, 1),
        driverKey: s.driverId,
        driverName: s.driverName ?? "Driver",
        experience: s.driverExperience ?? "novice",
        lapTimeMs: s.lapTimeEstimateMs,
      },
    ];
    if (s.coDriverId && s.coDriverId !== s.driverId) {
      drives.push({
        ...base,
        driveId: driveIdOf(s.entryId, 2),
        driverKey: s.coDriverId,
        driverName: s.coDriverName ?? "Co-driver",
        experience: s.coDriverExperience ?? "novice",
        lapTimeMs: s.coDriverLapTimeEstimateMs,
      });
    }
    return drives;
  });
}
