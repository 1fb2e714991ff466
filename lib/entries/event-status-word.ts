import { type EntryWindow, entryWindowProblem } from "./entry-window-problem";

/** An event's status as the public list says it, the entry window taken into account. */
export function eventStatusWord(window: EntryWindow, now: Date): string {
  switch (window.status) {
    case "draft":
      return "Not yet open";
    case "entries-closed":
      return "Entries closed";
    case "running":
      return "Running";
    case "finished":
      return "Finished";
    case "entries-open":
      if (entryWindowProblem(window, now) === null) return "Entries open";
      return window.opensAt && now.getTime() < window.opensAt.getTime()
        ? "Entries not open yet"
        : "Entries closed";
  }
}
