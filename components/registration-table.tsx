"use client";
import { type ReactNode, useMemo, useState } from "react";
import { filterRegistrationRows } from "@/lib/registration/filter-registration-rows";
import { type RegistrationRow, waiverLabels } from "@/lib/registration/registration-row";
import type {
  RegistrationSortKey,
  RegistrationView,
} from "@/lib/registration/registration-view-schema";
import { sortRegistrationRows } from "@/lib/registration/sort-registration-rows";
import { AttentionIcon, ClearedIcon, StoppedIcon } from "./icons/state-icons";

const columns: { key: RegistrationSortKey; label: string }[] = [
  { key: "car", label: "Car" },
  { key: "drivers", label: "Driver(s)" },
  { key: "waiver", label: "Waiver" },
  { key: "fee", label: "Fee" },
];

const waiverLook: Record<RegistrationRow["waiver"], { className: string; icon: ReactNode }> = {
  signed: { className: "text-cleared", icon: <ClearedIcon className="size-5 shrink-0" /> },
  "needs-guardian": {
    className: "text-attention",
    icon: <AttentionIcon className="size-5 shrink-0" />,
  },
  missing: { className: "text-stopped", icon: <StoppedIcon className="size-5 shrink-0" /> },
};

/**
 * The sign-on desk's table: search (car number first, then names), sort by any column, and
 * download what is shown as CSV (`csvPath` answers with the same search and sort).
 */
export function RegistrationTable({ rows, csvPath }: { rows: RegistrationRow[]; csvPath: string }) {
  const [view, setView] = useState<RegistrationView>({ q: "", sort: "car", dir: "asc" });
  const shown = useMemo(
    () => sortRegistrationRows(filterRegistrationRows(rows, view.q), view),
    [rows, view],
  );
  const csvHref = `${csvPath}?${new URLSearchParams({ ...view, q: view.q.trim() })}`;
  const sortBy = (key: RegistrationSortKey) =>
    setView((v) => ({
      ...v,
      sort: key,
      dir: v.sort === key && v.dir === "asc" ? "desc" : "asc",
    }));
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <label className="block min-w-0 flex-1 basis-64">
          <span className="field-label">Find a car</span>
          <input
            className="field-input"
            inputMode="search"
            placeholder="Car number or name"
            value={view.q}
            onChange={(e) => setView((v) => ({ ...v, q: e.target.value }))}
            data-testid="registration-search"
          />
        </label>
        <a href={csvHref} className="btn-secondary" download data-testid="registration-csv">
          Download CSV
        </a>
      </div>
      <p className="text-base text-asphalt-700" aria-live="polite">
        {shown.length} of {rows.length} entries
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-left text-base">
          <thead>
            <tr className="border-b-2 border-asphalt-800">
              {columns.map((c) => (
                <th
                  key={c.key}
                  className="p-1"
                  aria-sort={
                    view.sort === c.key ? (view.dir === "asc" ? "ascending" : "descending") : "none"
                  }
                >
                  <button
                    type="button"
                    className="inline-flex min-h-touch items-center gap-1 rounded px-1 font-semibold hover:bg-asphalt-100"
                    onClick={() => sortBy(c.key)}
                    data-testid={`sort-${c.key}`}
                  >
                    {c.label}
                    <span aria-hidden="true" className="w-4 text-asphalt-700">
                      {view.sort === c.key ? (view.dir === "asc" ? "▲" : "▼") : ""}
                    </span>
                  </button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {shown.map((r) => (
              <tr
                key={r.entryId}
                className="border-b border-asphalt-300"
                data-testid="registration-row"
                data-car-number={r.carNumber}
              >
                <td className="tabular p-2 text-xl font-bold">{r.carNumber}</td>
                <td className="p-2">
                  {r.drivers}
                  <span className="hidden text-asphalt-700 sm:block">{r.car}</span>
                </td>
                <td className={`p-2 font-semibold ${waiverLook[r.waiver].className}`}>
                  <span className="inline-flex items-center gap-1">
                    {waiverLook[r.waiver].icon}
                    {waiverLabels[r.waiver]}
                  </span>
                </td>
                <td className={`p-2 font-semibold ${r.paid ? "text-cleared" : "text-stopped"}`}>
                  <span className="inline-flex items-center gap-1 whitespace-nowrap">
                    {r.paid ? (
                      <ClearedIcon className="size-5 shrink-0" />
                    ) : (
                      <StoppedIcon className="size-5 shrink-0" />
                    )}
                    {r.paid ? "Paid" : "Not paid"}
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {shown.length === 0 ? (
        <p className="card" data-testid="registration-empty">
          {rows.length === 0 ? "No entries yet." : `No car matches “${view.q.trim()}”.`}
        </p>
      ) : null}
    </div>
  );
}
