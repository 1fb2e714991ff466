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
  dateText,
  briefingText,
  drives,
}: {
  entryId: string;
  eventId: string;
  version: number | null;
  publishedAtText: string | null;
  timeZone: string;
  /** The event's date ("Sat 12 Jun 2027") and the briefing's time, if any. */
  dateText: string | null;
  briefingText: string | null;
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
          <p className="text-lg">
            {dateText}
            {briefingText ? (
              <>
                {" "}
                · drivers&apos; briefing{" "}
                <span className="tabular font-semibold">{briefingText}</span>
              </>
            ) : null}
          </p>
          <ul className="space-y-3">
            {drives.map((d) => (
              <li key={d.driveId} className="text-lg" data-testid="entry-drive">
                <strong>{d.driverName}</strong>:{" "}
                <strong className="text-xl" data-testid="entry-group">
                  {d.groupName}
                </strong>
                <span className="mt-1 flex flex-wrap gap-x-4 gap-y-1 tabular">
                  {d.sessions.length === 0
                    ? "no session fits the day"
                    : d.sessions.map((s) => (
                        <span key={s.key} className="whitespace-nowrap">
                          R{s.round} {formatSessionSpan(s, timeZone)}
                        </span>
                      ))}
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
