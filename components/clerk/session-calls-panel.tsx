"use client";
import { formatWallClock } from "@/lib/paddock/format-wall-clock";
import type { LiveSession } from "@/lib/paddock/live-session";
import type { SessionCallState } from "@/lib/paddock/session-call";
import { SessionCallRow, sessionStateLabels } from "./session-call-row";

const ended = (s: LiveSession) => s.state === "finished" || s.state === "cut-short";

/**
 * During the day: the next sessions to mark (Called, On track, Red flag, Finished, Cut short) and
 * the whole day with the times as they now stand; a late or red-flagged session shifts every one
 * behind it (applySessionCalls), never earlier than planned.
 */
export function SessionCallsPanel({
  live,
  groupNames,
  timeZone,
  pending,
  now,
  onCall,
}: {
  live: LiveSession[];
  /** The server's clock (ISO), as this screen keeps it. */
  now: string;
  groupNames: string[];
  timeZone: string;
  pending: boolean;
  onCall: (sessionKey: string, state: SessionCallState, note: string) => void;
}) {
  // The next two sessions, and the last one that ended in the past 15 minutes (a finish marked by
  // mistake can still be put back on track).
  const nowMs = Date.parse(now);
  const lastEnded = live.filter(ended).at(-1);
  const recent =
    lastEnded && nowMs - Date.parse(lastEnded.expectedEndsAt) < 15 * 60_000 ? [lastEnded] : [];
  const current = [...recent, ...live.filter((s) => !ended(s)).slice(0, 2)];
  const name = (s: LiveSession) => groupNames[s.groupIndex - 1] ?? `Group ${s.groupIndex}`;
  const t = (iso: string) => formatWallClock(iso, timeZone);
  return (
    <section className="space-y-3" aria-labelledby="day-heading" data-testid="session-calls">
      <h2 id="day-heading" className="text-2xl font-bold">
        During the day
      </h2>
      {current.length === 0 ? (
        <p className="text-base">Every session of the published run sheet is over.</p>
      ) : (
        <ul className="grid gap-3 lg:grid-cols-2">
          {current.map((s) => (
            <SessionCallRow
              key={s.key}
              session={s}
              groupName={name(s)}
              timeZone={timeZone}
              pending={pending}
              onCall={onCall}
            />
          ))}
        </ul>
      )}
      <details className="card">
        <summary className="flex min-h-touch cursor-pointer items-center text-xl font-bold">
          The whole day as it now stands
        </summary>
        <table className="tabular w-full text-left text-base">
          <thead>
            <tr>
              <th className="py-1">Group</th>
              <th>Round</th>
              <th>Planned</th>
              <th>Now</th>
              <th>State</th>
            </tr>
          </thead>
          <tbody>
            {live.map((s) => (
              <tr key={s.key} className="border-t border-asphalt-200" data-testid="day-row">
                <td className="py-1 font-semibold">{name(s)}</td>
                <td>{s.round}</td>
                <td>
                  {t(s.startsAt)}–{t(s.endsAt)}
                </td>
                <td className={s.shiftedMinutes > 0 ? "font-semibold text-attention" : ""}>
                  {t(s.expectedStartsAt)}–{t(s.expectedEndsAt)}
                  {s.shiftedMinutes > 0 ? ` (+${s.shiftedMinutes})` : ""}
                </td>
                <td>{sessionStateLabels[s.state]}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </section>
  );
}
