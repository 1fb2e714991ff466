import type { ReactNode } from "react";

/** The top of every event page: what, where, when, and whose screen this is. */
export function EventHeading({
  roleLabel,
  title,
  event,
  children,
}: {
  roleLabel: string;
  title: string;
  event: { name: string; venueName: string; eventDate: string; timeZone: string };
  children?: ReactNode;
}) {
  return (
    <div className="mb-6 space-y-2">
      <p className="text-base font-semibold uppercase tracking-wider text-accent">{roleLabel}</p>
      <h1 className="text-3xl font-bold">{title}</h1>
      <p className="text-lg text-asphalt-800">
        {event.name} · {event.venueName} ·{" "}
        <time dateTime={event.eventDate}>{formatEventDate(event.eventDate)}</time>
      </p>
      {children}
    </div>
  );
}

function formatEventDate(isoDate: string): string {
  // The event date is a calendar date at the venue; format it without shifting zones.
  const [y, m, d] = isoDate.split("-").map(Number);
  const date = new Date(Date.UTC(y ?? 1970, (m ?? 1) - 1, d ?? 1));
  return new Intl.DateTimeFormat("en-GB", {
    weekday: "long",
    day: "numeric",
    month: "long",
    year: "numeric",
    timeZone: "UTC",
  }).format(date);
}
