import { formatWallClockSpan } from "../paddock/format-wall-clock";

/** A session's start and end as the venue's wall clock ("09:10–09:30"). Pure. */
export function formatSessionSpan(
  session: { startsAt: string; endsAt: string },
  timeZone: string,
): string {
  return formatWallClockSpan(session.startsAt, session.endsAt, timeZone);
}
