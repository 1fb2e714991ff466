"use client";
import { useMemo, useState } from "react";
import { dimensionLabel } from "@/lib/scrutineer/measurement/dimension-labels";
import { readingContext } from "@/lib/scrutineer/measurement/reading-context";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { resolveVoids } from "@/lib/scrutineer/records/resolve-voids";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { formatReadingValue } from "./format-reading-value";
import { ReadingEntry } from "./reading-entry";
import { readingTargets } from "./reading-targets";
import { sentenceCase } from "./sentence-case";
import { useTech } from "./tech-context";
import { VoidOwnRecord } from "./void-own-record";

type Reading = Extract<TechRecord, { kind: "reading" }>;

/** The readings part of the car card: what to read, what has been read, and the entry form. */
export function ReadingsPanel({
  entryId,
  records,
  verdict,
}: {
  entryId: string;
  records: TechRecord[];
  verdict: Verdict | null;
}) {
  const { pack, local, official } = useTech();
  const [open, setOpen] = useState<string | null>(null);
  // The engine's void rule, so the card strikes through exactly what the verdict leaves out.
  const { voided, voidedBy: voids } = useMemo(() => resolveVoids(records), [records]);
  const readings = records.filter((r): r is Reading => r.kind === "reading");
  // The car's other readings, as the engine sees them, to check a new reading against.
  const context = useMemo(
    () => readingContext(readings.filter((r) => !voided.has(r.id))),
    [readings, voided],
  );
  const nameOf = (id: string) =>
    id === official.id
      ? "you"
      : (pack.officials.find((o) => o.userId === id)?.name ?? "another official");
  const stateOf = (id: string) => local.find((l) => l.record.id === id)?.state;
  const groups = [...new Set(readingTargets.map((t) => t.group))];

  return (
    <section className="space-y-3" aria-labelledby="readings-title">
      <h2 id="readings-title" className="text-2xl font-bold">
        Readings
      </h2>
      {groups.map((group) => (
        <div key={group} className="space-y-2">
          <h3 className="text-lg font-semibold">{group}</h3>
          <ul className="space-y-2">
            {readingTargets
              .filter((t) => t.group === group)
              .map((target) => {
                const mine = readings.filter(
                  (r) =>
                    r.payload.dimension === target.dimension &&
                    (target.corner === null ||
                      ("corner" in r.payload && r.payload.corner === target.corner)),
                );
                const summary = verdict?.dimensions.find(
                  (d) => d.dimension === target.dimension && d.corner === target.corner,
                );
                const isOpen = open === target.key;
                return (
                  <li key={target.key} className="rounded-lg border-2 border-asphalt-300 bg-white">
                    <button
                      type="button"
                      className="flex min-h-touch w-full items-center justify-between gap-2 px-3 py-2 text-left"
                      onClick={() => setOpen(isOpen ? null : target.key)}
                      aria-expanded={isOpen}
                      data-testid={`reading-target-${target.key}`}
                    >
                      <span className="font-semibold">
                        {sentenceCase(dimensionLabel(target.dimension, target.corner))}
                      </span>
                      <span className="tabular text-base">
                        {summary
                          ? `${formatReadingValue(target.dimension, summary.mean, pack.event.unitSystem)} · ${summary.n}×`
                          : mine.length > 0
                            ? `${mine.length}×`
                            : "not read"}
                      </span>
                    </button>
                    {isOpen ? (
                      <div className="space-y-3 border-t border-asphalt-300 p-3">
                        {mine.length > 0 ? (
                          <ul className="space-y-1" data-testid="reading-list">
                            {mine.map((r) => (
                              <li
                                key={r.id}
                                className="flex flex-wrap items-center justify-between gap-2"
                              >
                                <span
                                  className={`tabular text-base ${voided.has(r.id) ? "line-through opacity-70" : ""}`}
                                >
                                  <strong>
                                    {formatReadingValue(
                                      r.payload.dimension,
                                      r.payload.value,
                                      pack.event.unitSystem,
                                    )}
                                  </strong>{" "}
                                  by {nameOf(r.officialId)} · {r.payload.instrument.name} ·{" "}
                                  {stateOf(r.id)
                                    ? stateOf(r.id) === "sent" || stateOf(r.id) === "duplicate"
                                      ? "sent"
                                      : "on this phone"
                                    : "on the server"}
                                  {voided.has(r.id) ? " · void" : ""}
                                </span>
                                {voided.has(r.id) ? (
                                  <span className="w-full text-base text-asphalt-800">
                                    Void: {voids.get(r.id)?.payload.reason}
                                  </span>
                                ) : (
                                  <VoidOwnRecord
                                    target={r}
                                    what={`your reading of ${formatReadingValue(r.payload.dimension, r.payload.value, pack.event.unitSystem)}`}
                                  />
                                )}
                              </li>
                            ))}
                          </ul>
                        ) : null}
                        <ReadingEntry
                          entryId={entryId}
                          dimension={target.dimension}
                          corner={target.corner}
                          earlier={mine}
                          voided={voided}
                          context={context}
                        />
                      </div>
                    ) : null}
                  </li>
                );
              })}
          </ul>
        </div>
      ))}
    </section>
  );
}
