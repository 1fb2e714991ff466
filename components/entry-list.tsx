"use client";
import Link from "next/link";
import { useMemo, useState } from "react";
import { CarAndDrivers } from "@/components/car-and-drivers";
import { CarNumberChip } from "@/components/car-number-chip";
import type { EntryListRow } from "@/lib/entries/to-entry-list-row";
import { SignOnChip } from "./sign-on-chip";
import { VerdictBadge } from "./verdict-badge";

/** A searchable list of entries, car number first; rows link (`hrefTemplate`) or call `onSelect`. */
export function EntryList({
  rows,
  hrefTemplate,
  onSelect,
  emptyText = "No entries yet.",
}: {
  rows: EntryListRow[];
  /** Link each row: `:entryId` in the template is replaced by the row's entry id. */
  hrefTemplate?: string;
  onSelect?: (entryId: string) => void;
  /** Said when there are no rows at all; a search that matches nothing says so instead. */
  emptyText?: string;
}) {
  const [query, setQuery] = useState("");
  const shown = useMemo(() => filterRows(rows, query), [rows, query]);
  return (
    <div className="space-y-3">
      <label className="block">
        <span className="field-label">Find a car</span>
        <input
          className="field-input"
          inputMode="search"
          placeholder="Car number, driver or car"
          value={query}
          onChange={(e) => setQuery(e.target.value)}
          data-testid="entry-search"
        />
      </label>
      <p className="text-base text-asphalt-700" aria-live="polite">
        {shown.length} of {rows.length} cars
      </p>
      {shown.length === 0 ? (
        <p className="card" data-testid="entry-list-empty">
          {rows.length > 0 && query.trim() ? `No car matches “${query.trim()}”.` : emptyText}
        </p>
      ) : null}
      <ul className="space-y-2">
        {shown.map((row) => {
          const body = (
            <div className="flex items-start gap-3">
              <CarNumberChip carNumber={row.carNumber} />
              <div className="min-w-0 flex-1">
                <CarAndDrivers
                  car={row.car}
                  declaredClass={row.declaredClass}
                  drivers={row.drivers}
                />
                <div className="mt-1 flex flex-wrap items-center gap-2">
                  <VerdictBadge status={row.status} toClass={row.finalClass} />
                  {row.needsChief ? (
                    <span className="text-base font-semibold text-attention">
                      For the chief scrutineer
                    </span>
                  ) : null}
                </div>
                {row.signOn ? (
                  <div className="mt-1">
                    <SignOnChip signOn={row.signOn} />
                  </div>
                ) : null}
                {row.reason ? (
                  <p className="mt-1 text-base text-asphalt-800">{row.reason}</p>
                ) : null}
              </div>
            </div>
          );
          return (
            <li
              key={row.entryId}
              className="card"
              data-testid="entry-row"
              data-car-number={row.carNumber}
            >
              {onSelect ? (
                <button
                  type="button"
                  className="block min-h-touch w-full text-left"
                  onClick={() => onSelect(row.entryId)}
                >
                  {body}
                </button>
              ) : hrefTemplate ? (
                <Link
                  href={hrefTemplate.replace(":entryId", row.entryId)}
                  className="block min-h-touch"
                >
                  {body}
                </Link>
              ) : (
                body
              )}
            </li>
          );
        })}
      </ul>
    </div>
  );
}

function filterRows(rows: EntryListRow[], query: string): EntryListRow[] {
  const q = query.trim().toLowerCase();
  if (!q) return rows;
  if (/^\d+$/.test(q)) return rows.filter((r) => String(r.carNumber).startsWith(q));
  return rows.filter((r) => `${r.car} ${r.drivers} ${r.declaredClass}`.toLowerCase().includes(q));
}
