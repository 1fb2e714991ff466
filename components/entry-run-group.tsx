import Link from "next/link";
import type { EntryDriveSessions } from "@/lib/run-sheet/entry-sessions";
import { formatSessionSpan } from "@/lib/run-sheet/format-session-span";

/** The entrant's run group(s) and session times from the latest published run sheet. */
export function EntryRunGroup({
  entryId,
  eventId,
  version,
  publishedAtText,
  timeZone,
  drives,
}: {
  entryId: string;
  eventId: string;
  version: number | null;
  publishedAtText: string | null;
  timeZone: string;
  drives: EntryDriveSessions[];
}) {
  return (
    <section
      className="card space-y-3"
      aria-labelledby="run-group-title"
      data-testid="entry-run-group"
    >
      <h2 id="run-group-title" className="text-xl font-bold">
        Your run group
      </h2>
      {version === null ? (
        <p className="text-lg">
          No run sheet is published yet. The clerk of course publishes it once cars are cleared and
          signed on; you will get an e-mail with your group and times.
        </p>
      ) : drives.length === 0 ? (
        <p className="text-lg">
          This car is not on run sheet version {version}. Only cars cleared at the tech line and
          signed on are put in run groups; ask the clerk of course if you think that is wrong.
        </p>
      ) : (
        <>
          <ul className="space-y-2">
            {drives.map((d) => (
              <li key={d.driveId} className="text-lg" data-testid="entry-drive">
                <strong>{d.driverName}</strong>:{" "}
                <strong data-testid="entry-group">{d.groupName}</strong> —{" "}
                <span className="tabular">
                  {d.sessions.map((s) => formatSessionSpan(s, timeZone)).join(", ") ||
                    "no session fits the day"}
                </span>
              </li>
            ))}
          </ul>
          <p className="text-base text-asphalt-700">
            Run sheet version {version}, published {publishedAtText}. Times are the venue&apos;s and
            can shift on the day: the{" "}
            <Link href={`/board/${eventId}`} className="underline">
              paddock board
            </Link>{" "}
            shows what is on track now. Groups are confirmed at the drivers&apos; briefing.
          </p>
          <a
            href={`/api/entries/${entryId}/calendar`}
            className="btn-secondary w-full sm:w-auto"
            data-testid="entry-calendar"
          >
            Add my sessions to a calendar (.ics)
          </a>
        </>
      )}
    </section>
  );
}
