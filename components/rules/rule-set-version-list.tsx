import Link from "next/link";
import type { RuleSetVersionRow } from "@/db/queries/list-rule-set-versions";

const when = new Intl.DateTimeFormat("en-GB", {
  dateStyle: "medium",
  timeStyle: "short",
  timeZone: "UTC",
});

/** Every saved version of the rule set, newest first, with what each is and what can be done. */
export function RuleSetVersionList({
  eventId,
  versions,
}: {
  eventId: string;
  versions: ReadonlyArray<RuleSetVersionRow>;
}) {
  return (
    <ul className="card divide-y divide-asphalt-200" data-testid="rule-set-versions">
      {versions.map((v) => (
        <li key={v.id} className="flex flex-wrap items-center justify-between gap-3 py-3">
          <div>
            <p className="text-lg font-semibold">
              Version {v.version}{" "}
              <span className="text-base font-normal text-asphalt-700">
                {v.pinned
                  ? "· pinned, judging this event"
                  : v.lockedAt
                    ? "· locked (was pinned)"
                    : "· saved draft"}
              </span>
            </p>
            <p className="text-base text-asphalt-800">
              {when.format(v.createdAt)} UTC{v.createdByName ? ` · ${v.createdByName}` : ""}
              {v.notes ? ` · ${v.notes}` : ""}
            </p>
          </div>
          <div className="flex flex-wrap gap-2">
            {v.pinned ? null : (
              <Link href={`/organizer/${eventId}/rules?version=${v.id}`} className="btn-secondary">
                Review
              </Link>
            )}
            <a href={`/api/events/${eventId}/rule-sets/${v.id}`} className="btn-secondary" download>
              JSON
            </a>
          </div>
        </li>
      ))}
    </ul>
  );
}
