import type { RunSheetDiff } from "../paddock/diff-run-sheets";
import { formatSessionSpan } from "./format-session-span";

/**
 * What changed for one entry between two run-sheet versions, a line each, in words: who moved
 * group, the groups it runs in whose session times changed (the new times are in the mail
 * itself), and a moved briefing or lunch. Pure.
 * @param groupsNow the groups the entry's drives are in on the new version
 */
export function describeEntryChanges(
  diff: RunSheetDiff,
  entryId: string,
  timeZone: string,
  groupsNow: readonly string[],
): string[] {
  const moves = diff.moved
    .filter((m) => m.entryId === entryId)
    .map((m) =>
      m.fromGroup === null
        ? `${m.driverName} added to ${m.toGroup}.`
        : m.toGroup === null
          ? `${m.driverName} taken off the run sheet (was in ${m.fromGroup}).`
          : `${m.driverName} moved from ${m.fromGroup} to ${m.toGroup}.`,
    );
  const retimed = [
    ...new Set(
      diff.timesChanged
        .filter((t) => groupsNow.includes(t.group) && t.entryIds.includes(entryId))
        .map((t) => t.group),
    ),
  ];
  const times = retimed.map((group) => `${group}: session times changed.`);
  const blocks = diff.blocksChanged.map((b) => {
    const what = b.kind === "briefing" ? "Drivers' briefing" : "Lunch break";
    return b.to ? `${what} now ${formatSessionSpan(b.to, timeZone)}.` : `${what}: none now.`;
  });
  return [...moves, ...times, ...blocks];
}
