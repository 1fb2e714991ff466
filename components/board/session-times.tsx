import { formatWallClock, formatWallClockSpan } from "@/lib/paddock/format-wall-clock";
import type { LiveSession } from "@/lib/paddock/live-session";

/** A session's expected times in the venue's zone, and the planned start beside it when the
 *  day has moved it ("10:52–11:12 · planned 10:40, 12 min late"). */
export function SessionTimes({ session, timeZone }: { session: LiveSession; timeZone: string }) {
  const span = formatWallClockSpan(session.expectedStartsAt, session.expectedEndsAt, timeZone);
  return (
    <span className="tabular" data-testid="session-times">
      <span className="font-semibold">{span}</span>
      {session.shiftedMinutes > 0 ? (
        <span className="text-attention">
          {" "}
          · planned {formatWallClock(session.startsAt, timeZone)}, {session.shiftedMinutes} min late
        </span>
      ) : null}
    </span>
  );
}
