import type { ReactNode } from "react";
import { formatEventDay } from "@/lib/passes/format-event-day";

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
        <time dateTime={event.eventDate}>{formatEventDay(event.eventDate)}</time>
      </p>
      {children}
    </div>
  );
}
