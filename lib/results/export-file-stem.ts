import { formatLocalDateTime } from "./format-local-date-time";

/**
 * A download's file name stem: what, the event, and the time of issue in the event's zone, so
 * two downloads of the day sort in order ("tech-results-club-day-2031-05-17-1432").
 * @param issuedAt ISO instant, or null before any verdict
 */
export function exportFileStem(args: {
  what: string;
  eventSlug: string;
  issuedAt: string | null;
  timeZone: string;
}): string {
  const when = args.issuedAt ? formatLocalDateTime(args.issuedAt, args.timeZone) : "";
  const stamp = when.replace(/[-: ]/g, (c) => (c === ":" ? "" : "-"));
  return [args.what, args.eventSlug, stamp].filter(Boolean).join("-");
}
