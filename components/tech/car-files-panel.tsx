"use client";
import { useQuery } from "@tanstack/react-query";
import { CAR_FILE_KINDS } from "@/lib/cars/car-file-limits";
import type { CarFileSummary } from "@/lib/cars/car-schema";
import { fetchJson } from "@/lib/query/fetch-json";

/**
 * The entrant's own photos of the car (front, side, rear with the wing) and the dyno sheet they
 * uploaded, on the car card. Read when there is signal: they are the entrant's, not the event
 * pack's, so with no signal the card says so and everything else still works.
 */
export function CarFilesPanel({ eventId, entryId }: { eventId: string; entryId: string }) {
  const { data, isPending, isError } = useQuery({
    queryKey: ["tech", eventId, "car-files", entryId],
    queryFn: () =>
      fetchJson<{ files: CarFileSummary[] }>(
        `/api/events/${eventId}/entries/${entryId}/car-files`,
      ).then((r) => r.files),
    retry: false,
    staleTime: 60_000,
  });
  const photos = (data ?? []).filter((f) => f.contentType !== "application/pdf");
  const sheet = (data ?? []).find((f) => f.kind === "dyno-sheet");
  return (
    <section
      className="card space-y-3"
      aria-label="Entrant's photos and dyno sheet"
      data-testid="car-files-panel"
    >
      <h2 className="text-xl font-bold">Entrant's photos and dyno sheet</h2>
      {isPending ? <p>Loading…</p> : null}
      {isError ? (
        <p>The entrant's photos need a signal; everything else on this card works without one.</p>
      ) : null}
      {data && data.length === 0 ? <p>The entrant has not uploaded any.</p> : null}
      {photos.length > 0 ? (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {photos.map((f) => (
            <li key={f.id} className="space-y-1">
              <a href={f.url} target="_blank" rel="noreferrer">
                {/* biome-ignore lint/performance/noImgElement: served by our own authorised route */}
                <img
                  src={f.url}
                  alt={CAR_FILE_KINDS[f.kind]}
                  className="w-full rounded-lg border border-asphalt-300 bg-asphalt-100"
                  width={f.widthPx ?? undefined}
                  height={f.heightPx ?? undefined}
                  data-testid="tech-car-photo"
                />
              </a>
              <p className="text-base">{CAR_FILE_KINDS[f.kind]}</p>
            </li>
          ))}
        </ul>
      ) : null}
      {sheet ? (
        <a
          href={sheet.url}
          target="_blank"
          rel="noreferrer"
          className="btn-secondary"
          data-testid="tech-dyno-sheet"
        >
          Open the dyno sheet{sheet.contentType === "application/pdf" ? " (PDF)" : ""}
        </a>
      ) : null}
    </section>
  );
}
