"use client";
import type { StoredPack } from "@/lib/offline/save-event-pack";

function timeIn(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat("en-GB", {
    hour: "2-digit",
    minute: "2-digit",
    day: "numeric",
    month: "short",
    timeZone,
  }).format(new Date(iso));
}

/** When this phone last fetched the event pack, and the "Prepare for offline" step. */
export function PackStatus({
  pack,
  preparing,
  message,
  onPrepare,
}: {
  pack: StoredPack | undefined;
  preparing: boolean;
  message: string | null;
  onPrepare: () => void;
}) {
  return (
    <section className="card space-y-2" aria-label="Event pack" data-testid="pack-status">
      {pack ? (
        <p className="text-base">
          <strong>Event pack:</strong> {pack.entries.length} cars, fetched{" "}
          <time dateTime={pack.fetchedAt} data-testid="pack-fetched-at">
            {timeIn(pack.fetchedAt, pack.event.timeZone)}
          </time>
          .
        </p>
      ) : (
        <p className="text-base font-semibold">
          No event pack on this phone yet. Prepare it while you have signal.
        </p>
      )}
      <button
        type="button"
        className="btn-primary w-full sm:w-auto"
        onClick={onPrepare}
        disabled={preparing}
      >
        {preparing ? "Preparing…" : "Prepare for offline"}
      </button>
      {message ? (
        <p className="text-base" role="status" data-testid="prepare-message">
          {message}
        </p>
      ) : null}
    </section>
  );
}
