import { formatLocalDateTime } from "../results/format-local-date-time";

/**
 * The entry window in the venue's time zone, in words: "Opens 2031-05-01 09:00 · closes
 * 2031-05-20 00:00 (Europe/London time)"; an open end says so.
 */
export function formatEntryWindow({
  opensAt,
  closesAt,
  timeZone,
}: {
  opensAt: Date | null;
  closesAt: Date | null;
  timeZone: string;
}): string {
  const at = (d: Date) => formatLocalDateTime(d.toISOString(), timeZone);
  const open = opensAt ? `Opens ${at(opensAt)}` : "Open now";
  const close = closesAt ? `closes ${at(closesAt)}` : "closes when the organizer closes entries";
  return `${open} · ${close} (${timeZone} time)`;
}
