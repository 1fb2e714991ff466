/** What decides whether an event takes entries at a given instant. */
export type EntryWindow = {
  status: "draft" | "entries-open" | "entries-closed" | "running" | "finished";
  /** Instants; null = open while the status says entries-open. */
  opensAt: Date | null;
  closesAt: Date | null;
};

/**
 * Why an event does not take an entry at `now`, in words for the entrant; null when it does.
 * The window is half-open: entries from `opensAt` (inclusive) until `closesAt` (exclusive).
 */
export function entryWindowProblem(window: EntryWindow, now: Date): string | null {
  if (window.status !== "entries-open") return "This event is not taking entries.";
  if (window.opensAt && now.getTime() < window.opensAt.getTime()) {
    return "Entries for this event have not opened yet.";
  }
  if (window.closesAt && now.getTime() >= window.closesAt.getTime()) {
    return "Entries for this event have closed.";
  }
  return null;
}
