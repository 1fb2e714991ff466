import type { RunSheet } from "../paddock/run-sheet-schema";
import type { ScheduledSession } from "../paddock/scheduled-session";

/** One drive of an entry on a run sheet: its group and that group's sessions. */
export type EntryDriveSessions = {
  driveId: string;
  driverName: string;
  groupName: string;
  sessions: ScheduledSession[];
};

/** The entry's drives on a run sheet (one, or two for a shared car), each with its sessions. */
export function entrySessions(sheet: RunSheet, entryId: string): EntryDriveSessions[] {
  return sheet.drives
    .filter((d) => d.entryId === entryId)
    .flatMap((drive) => {
      const index = sheet.groups.findIndex((g) => g.driveIds.includes(drive.driveId));
      const group = sheet.groups[index];
      if (!group) return [];
      return [
        {
          driveId: drive.driveId,
          driverName: drive.driverName,
          groupName: group.name,
          sessions: sheet.sessions.filter((s) => s.groupIndex === index + 1),
        },
      ];
    });
}
