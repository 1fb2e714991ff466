import type { ExperienceLevel } from "../paddock/drive";
import { formatWallClock } from "../paddock/format-wall-clock";
import type { RunSheetPublication } from "../paddock/run-sheet-schema";

/** One drive as printed in its group. */
export type PrintedDrive = {
  driveId: string;
  carNumber: number;
  driverName: string;
  className: string;
  experience: ExperienceLevel;
  /** For a shared car: the other driver and the group they run in. */
  sharedWith: { driverName: string; groupName: string | null } | null;
};

/** One run group as printed: its sessions in the venue's time, then its drives in run order. */
export type PrintedGroup = {
  index: number;
  name: string;
  sessions: { round: number; starts: string; ends: string }[];
  drives: PrintedDrive[];
};

/** A published run sheet laid out for print. */
export type RunSheetPrint = {
  version: number;
  publishedAt: string;
  timeZone: string;
  eventDate: string;
  briefing: { starts: string; ends: string } | null;
  lunch: { starts: string; ends: string } | null;
  groups: PrintedGroup[];
  /** Drives on the sheet in no group (should be none). */
  unplaced: PrintedDrive[];
  /** Constraints that gave way, in words. */
  notes: string[];
  cap: string;
};

/**
 * A published run sheet for print: one entry per group in rotation order, with each round's
 * session as the venue's wall-clock times ("09:30"–"09:50", tz database through Intl) and its
 * drives in run order; shared cars name the other driver's group. Pure.
 */
export function shapeRunSheetPrint(publication: RunSheetPublication): RunSheetPrint {
  const sheet = publication.body;
  const zone = sheet.timeZone;
  const time = (iso: string) => formatWallClock(iso, zone);
  const drives = new Map(sheet.drives.map((d) => [d.driveId, d]));
  const groupOf = new Map<string, string>();
  sheet.groups.forEach((g) => {
    for (const id of g.driveIds) groupOf.set(id, g.name);
  });
  const printed = (driveId: string): PrintedDrive | null => {
    const d = drives.get(driveId);
    if (!d) return null;
    const other = sheet.drives.find((x) => x.entryId === d.entryId && x.driveId !== d.driveId);
    return {
      driveId: d.driveId,
      carNumber: d.carNumber,
      driverName: d.driverName,
      className: d.className,
      experience: d.experience,
      sharedWith: other
        ? { driverName: other.driverName, groupName: groupOf.get(other.driveId) ?? null }
        : null,
    };
  };
  const block = (kind: "briefing" | "lunch") => {
    const b = sheet.blocks.find((x) => x.kind === kind);
    return b ? { starts: time(b.startsAt), ends: time(b.endsAt) } : null;
  };
  return {
    version: publication.version,
    publishedAt: publication.publishedAt,
    timeZone: zone,
    eventDate: sheet.eventDate,
    briefing: block("briefing"),
    lunch: block("lunch"),
    groups: sheet.groups.map((g, i) => ({
      index: i + 1,
      name: g.name,
      sessions: sheet.sessions
        .filter((s) => s.groupIndex === i + 1)
        .sort((a, b) => a.round - b.round)
        .map((s) => ({ round: s.round, starts: time(s.startsAt), ends: time(s.endsAt) })),
      drives: g.driveIds.flatMap((id) => {
        const d = printed(id);
        return d ? [d] : [];
      }),
    })),
    unplaced: sheet.drives
      .filter((d) => !groupOf.has(d.driveId))
      .flatMap((d) => {
        const p = printed(d.driveId);
        return p ? [p] : [];
      }),
    notes: sheet.gaveWay.map((g) => g.text),
    cap: `Cars per group at most: ${sheet.cap.source}`,
  };
}
