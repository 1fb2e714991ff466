import { driveIdOf } from "../paddock/drive";
import type { RunSheetPublication } from "../paddock/run-sheet-schema";
import type { VerdictWord } from "../verdict-word";
import type { BoardDrive, BoardRunSheet } from "./board-schema";
import { driveFlag } from "./drive-flag";

/** An entry as it stands now (withdrawn entries are left out of the list). */
export type BoardEntryState = { entryId: string; status: VerdictWord };

/**
 * The published run sheet cut down for the public board: groups of car numbers and classes, no
 * names, each car flagged when it may no longer run as published. Pure.
 * @param entries the event's entries that are still entered, with their verdict now
 */
export function shapeBoardRunSheet({
  publication,
  entries,
}: {
  publication: RunSheetPublication;
  entries: BoardEntryState[];
}): BoardRunSheet {
  const { body } = publication;
  const statusOf = new Map(entries.map((e) => [e.entryId, e.status]));
  const drivesOf = new Map<string, number>();
  for (const drive of body.drives)
    drivesOf.set(drive.entryId, (drivesOf.get(drive.entryId) ?? 0) + 1);
  const byId = new Map(body.drives.map((d) => [d.driveId, d]));
  const groups = body.groups.map((group, i) => ({
    index: i + 1,
    name: group.name,
    drives: group.driveIds.flatMap((driveId): BoardDrive[] => {
      const drive = byId.get(driveId);
      if (!drive) return [];
      const slot = driveId === driveIdOf(drive.entryId, 2) ? 2 : 1;
      const status = statusOf.get(drive.entryId) ?? null;
      return [
        {
          key: `${drive.carNumber}-${slot}`,
          carNumber: drive.carNumber,
          className: drive.className,
          slot,
          shared: (drivesOf.get(drive.entryId) ?? 0) > 1,
          status,
          flag: driveFlag(status),
        },
      ];
    }),
  }));
  return {
    version: publication.version,
    publishedAt: publication.publishedAt,
    groups,
    sessions: body.sessions,
    blocks: body.blocks,
  };
}
