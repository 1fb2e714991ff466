import type { RunSheet } from "./run-sheet-schema";
import type { SessionCall } from "./session-call";

/** A mark as stored: the session it was made on, and its group's name and round. */
export type StoredSessionCall = SessionCall & { groupName: string; round: number };

/**
 * The day's marks as they apply to a run sheet: each follows its group (by name) and round, so a
 * later version that reorders the groups keeps "finished" on the group that finished. A mark whose
 * group or round is not on this sheet is left out. Pure.
 */
export function callsOnSheet(calls: readonly StoredSessionCall[], sheet: RunSheet): SessionCall[] {
  const keys = new Set(sheet.sessions.map((s) => s.key));
  return calls.flatMap(({ groupName, round, ...call }) => {
    const index = sheet.groups.findIndex((g) => g.name === groupName);
    const sessionKey = `${round}-${index + 1}`;
    return index >= 0 && keys.has(sessionKey) ? [{ ...call, sessionKey }] : [];
  });
}
