import { buildSchedule } from "@/lib/paddock/build-schedule";
import type { Drive } from "@/lib/paddock/drive";
import type { RunSheet } from "@/lib/paddock/run-sheet-schema";
import type { ScheduleSettings } from "@/lib/paddock/schedule-settings";

// Invented demo data for the run-sheet tests: names, numbers and classes are ours.
export const settings: ScheduleSettings = {
  dayStart: "09:00",
  dayEnd: "17:00",
  sessionMinutes: 20,
  gapMinutes: 10,
  lunch: { start: "12:30", minutes: 45 },
  rounds: 3,
  briefing: { start: "08:15", minutes: 30 },
};

export function drive(
  entryId: string,
  slot: 1 | 2,
  carNumber: number,
  driverName: string,
  over: Partial<Drive> = {},
): Drive {
  return {
    driveId: `${entryId}:${slot}`,
    entryId,
    carNumber,
    carKey: `car-${entryId}`,
    driverKey: driverName.toLowerCase().replace(/\s+/g, "-"),
    driverName,
    classId: "street",
    className: "Street",
    classRank: 0,
    experience: "intermediate",
    lapTimeMs: 102_500,
    ...over,
  };
}

export const drives: Drive[] = [
  drive("e1", 1, 7, "Ada Quill", { experience: "advanced", lapTimeMs: 98_250 }),
  drive("e1", 2, 7, "Ben Quill", { experience: "novice", lapTimeMs: 109_000 }),
  drive("e2", 1, 12, "Cleo Marsh", { classId: "sport", className: "Sport", classRank: 1 }),
  drive("e3", 1, 21, "Dev Ostrander", { lapTimeMs: null }),
  drive("e4", 1, 33, "Eli Fenwick", { experience: "novice" }),
];

/** A run sheet with the given groups (name → drive ids) on 2027-06-12 in Europe/London. */
export function sheet(
  groups: [string, string[]][],
  over: {
    settings?: ScheduleSettings;
    drives?: Drive[];
    timeZone?: string;
    eventDate?: string;
  } = {},
): RunSheet {
  const timeZone = over.timeZone ?? "Europe/London";
  const eventDate = over.eventDate ?? "2027-06-12";
  const s = over.settings ?? settings;
  const { sessions, blocks } = buildSchedule({
    eventDate,
    timeZone,
    settings: s,
    groupCount: groups.length,
  });
  return {
    timeZone,
    eventDate,
    drives: over.drives ?? drives,
    groups: groups.map(([name, driveIds]) => ({ name, driveIds })),
    settings: s,
    sessions,
    blocks,
    explanations: {},
    gaveWay: [],
    cap: { cars: 12, source: "12 cars: set by the organizer" },
  };
}
