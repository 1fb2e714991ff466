import type { Drive } from "../../lib/paddock/drive";
import { type RunSheet, runSheetSchema } from "../../lib/paddock/run-sheet-schema";
import type { ScheduledSession } from "../../lib/paddock/scheduled-session";

/** A car as a test's run sheet takes it: the entry, its number, class and driver(s). */
export type TestSheetCar = {
  entryId: string;
  carNumber: number;
  classId: string;
  className: string;
  classRank: number;
  driver: { key: string; name: string };
  coDriver: { key: string; name: string } | null;
};

const minuteMs = 60_000;

/**
 * A run sheet for the board's tests (invented, not the builder's work): the cars' drives dealt
 * round-robin into `groupCount` groups (a shared car's two drives land in different groups) and
 * `rounds` rounds of sessions from `firstStart`, `sessionMinutes` long with `gapMinutes` between.
 * Parsed with the stored schema, so what is inserted reads back as a publication would.
 */
export function testRunSheet({
  cars,
  groupCount,
  rounds,
  firstStart,
  sessionMinutes = 20,
  gapMinutes = 5,
  timeZone,
  eventDate,
}: {
  cars: TestSheetCar[];
  groupCount: number;
  rounds: number;
  firstStart: Date;
  sessionMinutes?: number;
  gapMinutes?: number;
  timeZone: string;
  eventDate: string;
}): RunSheet {
  const drives: Drive[] = cars.flatMap((car) =>
    [car.driver, car.coDriver].flatMap((driver, i) =>
      driver
        ? [
            {
              driveId: `${car.entryId}:${i + 1}`,
              entryId: car.entryId,
              carNumber: car.carNumber,
              carKey: car.entryId,
              driverKey: driver.key,
              driverName: driver.name,
              classId: car.classId,
              className: car.className,
              classRank: car.classRank,
              experience: "intermediate" as const,
              lapTimeMs: null,
            },
          ]
        : [],
    ),
  );
  const groups = Array.from({ length: groupCount }, (_, g) => ({
    name: `Group ${String.fromCharCode(65 + g)}`,
    driveIds: drives.filter((_, i) => i % groupCount === g).map((d) => d.driveId),
  }));
  const sessions: ScheduledSession[] = [];
  let at = firstStart.getTime();
  for (let round = 1; round <= rounds; round += 1)
    for (let groupIndex = 1; groupIndex <= groupCount; groupIndex += 1) {
      sessions.push({
        key: `${round}-${groupIndex}`,
        round,
        groupIndex,
        startsAt: new Date(at).toISOString(),
        endsAt: new Date(at + sessionMinutes * minuteMs).toISOString(),
      });
      at += (sessionMinutes + gapMinutes) * minuteMs;
    }
  return runSheetSchema.parse({
    timeZone,
    eventDate,
    drives,
    groups,
    settings: {
      dayStart: "08:00",
      dayEnd: "18:00",
      sessionMinutes,
      gapMinutes,
      lunch: null,
      rounds,
      briefing: null,
    },
    sessions,
    blocks: [],
    explanations: Object.fromEntries(drives.map((d) => [d.driveId, "Placed by the test."])),
    gaveWay: [],
    cap: { cars: Math.ceil(drives.length / groupCount), source: "set by the test" },
  });
}
