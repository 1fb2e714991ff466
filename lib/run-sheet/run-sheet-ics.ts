import { createEvents, type EventAttributes } from "ics";
import type { Drive } from "@/lib/paddock/drive";
import type { RunSheet } from "@/lib/paddock/run-sheet-schema";

/** The calendar's product identifier (RFC 5545 PRODID). */
const productId = "-//Plumbline//Run sheet//EN";

/**
 * An entrant's sessions as an iCalendar file (RFC 5545), built with the `ics` package: one event
 * for the drivers' briefing and one for each session of each of the entry's drives (a shared car
 * has two drivers, so two sets), all in UTC.
 *
 * A calendar app recognises an event again by its UID and takes the higher SEQUENCE as the newer
 * copy (RFC 5545 §3.8.4.7, §3.8.7.4). The UID names the drive and the round, not the group, so
 * when a republication moves the driver to another group or time the same event is updated
 * instead of a second one appearing; SEQUENCE is the run sheet's version. With `cancelled`, the
 * same events (from the sheet the car was last on) go out as cancelled (METHOD:CANCEL, STATUS:
 * CANCELLED, RFC 5546 §3.2.5) with the new version's SEQUENCE, so a calendar drops the sessions of
 * a car taken off the run sheet.
 * @throws RangeError when the entry has no drive on the sheet, or the package rejects the events
 */
export function runSheetIcs({
  runSheet,
  entryId,
  eventName,
  venueName,
  version,
  cancelled = false,
}: {
  runSheet: RunSheet;
  entryId: string;
  eventName: string;
  venueName: string;
  /** The publication's version (1, 2, …): the events' SEQUENCE. */
  version: number;
  /** The car is no longer on the run sheet: cancel these sessions. */
  cancelled?: boolean;
}): string {
  const drives = runSheet.drives.filter((d) => d.entryId === entryId);
  if (drives.length === 0) throw new RangeError(`Entry ${entryId} has no drive on this run sheet`);
  const rounds = Math.max(0, ...runSheet.sessions.map((s) => s.round));
  const common = {
    location: venueName,
    sequence: version,
    status: cancelled ? ("CANCELLED" as const) : ("CONFIRMED" as const),
    startInputType: "utc" as const,
    startOutputType: "utc" as const,
    endInputType: "utc" as const,
    endOutputType: "utc" as const,
  };
  const later =
    "Times can move on the day; the paddock board shows the live times. The officials' instructions on the day come first.";

  const events: EventAttributes[] = [];
  const briefing = runSheet.blocks.find((b) => b.kind === "briefing");
  if (briefing !== undefined) {
    events.push({
      ...common,
      uid: `${entryId}-briefing@plumbline`,
      title: `${eventName}: drivers' briefing`,
      description: `Run groups are confirmed at the briefing. Run sheet version ${version}.`,
      start: Date.parse(briefing.startsAt),
      end: Date.parse(briefing.endsAt),
    });
  }
  const shared = drives.length > 1;
  for (const drive of drives) {
    const groupIndex = runSheet.groups.findIndex((g) => g.driveIds.includes(drive.driveId));
    const group = runSheet.groups[groupIndex];
    if (group === undefined) continue;
    for (const session of runSheet.sessions.filter((s) => s.groupIndex === groupIndex + 1)) {
      events.push({
        ...common,
        uid: `${drive.driveId}-round-${session.round}@plumbline`,
        title: `${eventName}: ${group.name}, round ${session.round}${label(drive, shared)}`,
        description: `Car ${drive.carNumber}, ${drive.driverName}: ${group.name}, round ${session.round} of ${rounds}. Run sheet version ${version}. ${later}`,
        start: Date.parse(session.startsAt),
        end: Date.parse(session.endsAt),
      });
    }
  }

  const { error, value } = createEvents(events, {
    productId,
    method: cancelled ? "CANCEL" : "PUBLISH",
    calName: `${eventName}: car ${drives[0]?.carNumber ?? ""}`,
  });
  if (error !== null || value === null) {
    throw new RangeError(`Could not write the calendar: ${error?.message ?? "no output"}`);
  }
  return value;
}

/** Names the driver in the title when the car is shared, so the two drivers' sessions differ. */
function label(drive: Drive, shared: boolean): string {
  return shared ? ` (car ${drive.carNumber}, ${drive.driverName})` : ` (car ${drive.carNumber})`;
}
