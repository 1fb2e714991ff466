import type { EventSummary } from "../../db/queries/get-event-summary";

/** The event's stage in words for people (the stored value is a code such as "running"). */
export const eventStatusLabels: Record<EventSummary["status"], string> = {
  draft: "Draft, not open for entries yet",
  "entries-open": "Open for entries",
  "entries-closed": "Entries closed",
  running: "Under way (event day)",
  finished: "Finished",
};
