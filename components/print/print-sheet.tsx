import "./print.css";
import type { ReactNode } from "react";
import { AttentionIcon } from "@/components/icons/state-icons";
import { formatEventDay } from "@/lib/passes/format-event-day";
import { PrintButton } from "./print-button";

/**
 * A print layout's frame: whose sheet, what, the event, its standing line (provisional and time
 * of issue, or a run sheet's version), the caution, and — on screen only — Print and the CSV.
 */
export function PrintSheet({
  roleLabel,
  title,
  event,
  standing,
  notice,
  csvHref,
  backHref,
  units,
  children,
}: {
  roleLabel: string;
  title: string;
  event: { name: string; venueName: string; eventDate: string; timeZone: string };
  /** "Provisional — issued 14:32 on Sat 17 May 2031 (Europe/London time)". */
  standing: ReactNode;
  notice: string;
  csvHref: string;
  backHref?: { href: string; label: string };
  /** The event's length unit, which every reading and limit in the words is given in. */
  units?: "mm" | "in";
  children: ReactNode;
}) {
  return (
    <article className="print-sheet space-y-4" data-testid="print-sheet">
      <header className="space-y-1 border-b-2 border-asphalt-950 pb-2">
        <p className="text-base font-semibold uppercase tracking-wider text-accent print:text-asphalt-950">
          {roleLabel}
        </p>
        <h1 className="text-3xl font-bold">{title}</h1>
        <p className="text-lg text-asphalt-800">
          {event.name} · {event.venueName} ·{" "}
          <time dateTime={event.eventDate}>{formatEventDay(event.eventDate)}</time> · times in{" "}
          {event.timeZone}
          {units ? ` · lengths in ${units === "mm" ? "millimetres (mm)" : "inches (in)"}` : null}
        </p>
        <p className="text-lg font-semibold" data-testid="print-standing">
          {standing}
        </p>
      </header>
      <nav className="flex flex-wrap gap-3 print:hidden" aria-label="Print and download">
        <PrintButton />
        <a className="btn-secondary" href={csvHref} download>
          Download CSV
        </a>
        {backHref ? (
          <a className="btn-secondary" href={backHref.href}>
            {backHref.label}
          </a>
        ) : null}
      </nav>
      <aside
        className="flex gap-2 rounded-lg border-2 border-attention-line bg-attention-soft p-2 text-base text-attention print:border-asphalt-950 print:bg-white print:text-asphalt-950"
        aria-label="Caution"
        data-testid="print-notice"
      >
        <AttentionIcon className="mt-0.5 size-5 shrink-0" />
        <p>{notice}</p>
      </aside>
      {children}
    </article>
  );
}
