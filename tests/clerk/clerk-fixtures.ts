import type { Drive } from "@/lib/paddock/drive";
import type { RunGroup } from "@/lib/paddock/run-group-plan";

// Invented cars for the clerk's page tests (demo data only, not trade facts).
export function drive(entry: number, slot: 1 | 2, overrides: Partial<Drive> = {}): Drive {
  return {
    driveId: `e${entry}:${slot}`,
    entryId: `e${entry}`,
    carNumber: entry,
    carKey: `car-${entry}`,
    driverKey: `driver-${entry}-${slot}`,
    driverName: `Driver ${entry}${slot === 2 ? "b" : ""}`,
    classId: "kestrel",
    className: "Kestrel",
    classRank: 0,
    experience: "intermediate",
    lapTimeMs: 100_000 + entry * 500,
    ...overrides,
  };
}

/** Cars 1–6, car 3 shared by two drivers (3:1 in Group 1, 3:2 in Group 3: not back to back). */
export const drives: Drive[] = [
  drive(1, 1),
  drive(2, 1),
  drive(3, 1),
  drive(3, 2),
  drive(4, 1),
  drive(5, 1),
  drive(6, 1),
];

export const groups: RunGroup[] = [
  { name: "Group 1", driveIds: ["e1:1", "e2:1", "e3:1"] },
  { name: "Group 2", driveIds: ["e4:1", "e5:1"] },
  { name: "Group 3", driveIds: ["e3:2", "e6:1"] },
];
