import type { RunSheet } from "./run-sheet-schema";

/** A drive that changed group between two publications; null = not on that sheet (added/removed). */
export type MovedDrive = {
  driveId: string;
  entryId: string;
  carNumber: number;
  driverName: string;
  fromGroup: string | null;
  toGroup: string | null;
};

/** A span of time, UTC ISO instants. */
export type TimeSpan = { startsAt: string; endsAt: string };

/** A group's session in one round whose time changed; null = no such session on that sheet. */
export type SessionTimeChange = {
  group: string;
  round: number;
  from: TimeSpan | null;
  to: TimeSpan | null;
  /** The entries with a drive in this group on either sheet. */
  entryIds: string[];
};

/** The briefing or lunch break moved, appeared or went. */
export type BlockTimeChange = {
  kind: "briefing" | "lunch";
  from: TimeSpan | null;
  to: TimeSpan | null;
};

export type RunSheetDiff = {
  moved: MovedDrive[];
  timesChanged: SessionTimeChange[];
  blocksChanged: BlockTimeChange[];
  /** Every entry on the new sheet (a changed briefing concerns them all). */
  entryIds: string[];
};

type SheetIndex = {
  groupOfDrive: Map<string, string>;
  sessions: Map<string, TimeSpan>;
  entriesOfGroup: Map<string, string[]>;
};

function indexSheet(sheet: RunSheet): SheetIndex {
  const entryOfDrive = new Map(sheet.drives.map((d) => [d.driveId, d.entryId]));
  const groupOfDrive = new Map<string, string>();
  const entriesOfGroup = new Map<string, string[]>();
  for (const group of sheet.groups) {
    const entries = new Set<string>();
    for (const driveId of group.driveIds) {
      groupOfDrive.set(driveId, group.name);
      const entryId = entryOfDrive.get(driveId);
      if (entryId !== undefined) entries.add(entryId);
    }
    entriesOfGroup.set(group.name, [...entries].sort());
  }
  const sessions = new Map<string, TimeSpan>();
  for (const s of sheet.sessions) {
    const name = sheet.groups[s.groupIndex - 1]?.name;
    if (name !== undefined) {
      sessions.set(JSON.stringify([name, s.round]), { startsAt: s.startsAt, endsAt: s.endsAt });
    }
  }
  return { groupOfDrive, sessions, entriesOfGroup };
}

const sameSpan = (a: TimeSpan | null, b: TimeSpan | null) =>
  a === null || b === null
    ? a === b
    : Date.parse(a.startsAt) === Date.parse(b.startsAt) &&
      Date.parse(a.endsAt) === Date.parse(b.endsAt);

/**
 * What changed between two published run sheets: who moved group (or was added or removed),
 * which group's session in which round changed time, and whether the briefing or lunch moved.
 * Groups are matched by name (the name read out at the briefing), sessions by group name and
 * round, so reordering the rotation shows as changed times, not as moved drives. With no previous
 * sheet, everything is new. Pure.
 */
export function diffRunSheets(previous: RunSheet | null, next: RunSheet): RunSheetDiff {
  const before: SheetIndex = previous
    ? indexSheet(previous)
    : { groupOfDrive: new Map(), sessions: new Map(), entriesOfGroup: new Map() };
  const after = indexSheet(next);

  const drives = new Map(
    [...(previous?.drives ?? []), ...next.drives].map((d) => [d.driveId, d] as const),
  );
  const moved: MovedDrive[] = [];
  for (const drive of drives.values()) {
    const fromGroup = before.groupOfDrive.get(drive.driveId) ?? null;
    const toGroup = after.groupOfDrive.get(drive.driveId) ?? null;
    if (fromGroup === toGroup) continue;
    moved.push({
      driveId: drive.driveId,
      entryId: drive.entryId,
      carNumber: drive.carNumber,
      driverName: drive.driverName,
      fromGroup,
      toGroup,
    });
  }
  moved.sort((a, b) => a.carNumber - b.carNumber || a.driveId.localeCompare(b.driveId));

  const timesChanged: SessionTimeChange[] = [];
  for (const key of new Set([...before.sessions.keys(), ...after.sessions.keys()])) {
    const from = before.sessions.get(key) ?? null;
    const to = after.sessions.get(key) ?? null;
    if (sameSpan(from, to)) continue;
    const [group, round] = JSON.parse(key) as [string, number];
    const entryIds = [
      ...new Set([
        ...(before.entriesOfGroup.get(group) ?? []),
        ...(after.entriesOfGroup.get(group) ?? []),
      ]),
    ].sort();
    timesChanged.push({ group, round, from, to, entryIds });
  }
  const firstStart = (c: SessionTimeChange) => Date.parse((c.to ?? c.from)?.startsAt ?? "");
  timesChanged.sort((a, b) => firstStart(a) - firstStart(b) || a.group.localeCompare(b.group));

  const blocksChanged: BlockTimeChange[] = [];
  for (const kind of ["briefing", "lunch"] as const) {
    const span = (sheet: RunSheet | null) => {
      const b = sheet?.blocks.find((x) => x.kind === kind);
      return b === undefined ? null : { startsAt: b.startsAt, endsAt: b.endsAt };
    };
    const from = span(previous);
    const to = span(next);
    if (!sameSpan(from, to)) blocksChanged.push({ kind, from, to });
  }

  const entryIds = [...new Set(next.drives.map((d) => d.entryId))].sort();
  return { moved, timesChanged, blocksChanged, entryIds };
}

/**
 * The entries to e-mail after a publication: those with a drive that moved, was added or was
 * removed, or that runs in a group whose session times changed; everyone on the new sheet when the
 * briefing (which is in their calendar file) moved. An entry where nothing changed gets no e-mail.
 */
export function changedEntryIds(diff: RunSheetDiff): string[] {
  const ids = new Set<string>();
  for (const m of diff.moved) ids.add(m.entryId);
  for (const t of diff.timesChanged) for (const id of t.entryIds) ids.add(id);
  if (diff.blocksChanged.some((b) => b.kind === "briefing")) {
    for (const id of diff.entryIds) ids.add(id);
  }
  return [...ids].sort();
}
