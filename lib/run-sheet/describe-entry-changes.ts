import type { RunSheetDiff } from "../paddock/diff-run-sheets";
import { formatSessionSpan } from "./format-session-span";

/** What changed for one entry between two run-sheet versions, a line each, in words. Pure. */
export function describeEntryChanges(
  diff: RunSheetDiff,
  entryId: string,
  timeZone: string,
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
  const times = diff.timesChanged
    .filter((t) => t.entryIds.includes(entryId))
    .map((t) => {
      const from = t.from ? formatSessionSpan(t.from, timeZone) : "none";
      const to = t.to ? formatSessionSpan(t.to, timeZone) : "none";
      return `${t.group}, round ${t.round}: ${from} → ${to}.`;
    });
  const blocks = diff.blocksChanged.map((b) => {
    const what = b.kind === "briefing" ? "Drivers' briefing" : "Lunch break";
    const to = b.to ? formatSessionSpan(b.to, timeZone) : "none";
    return `${what} now ${to}.`;
  });
  return [...moves, ...times, ...blocks];
}
