import type { PrintedDrive, RunSheetPrint } from "@/lib/run-sheet/shape-run-sheet-print";
import { PrintBlock } from "./print-block";
import { PrintCarNumber } from "./print-car-number";

const experienceWords = {
  novice: "Novice",
  intermediate: "Intermediate",
  advanced: "Advanced",
  expert: "Expert",
} as const;

/** The published run sheet: the day's fixed blocks, then one block per run group (rotation
 *  order) with its session times and its cars, numbers large. */
export function RunSheetSheet({ sheet }: { sheet: RunSheetPrint }) {
  return (
    <div className="space-y-4">
      <ul className="flex flex-wrap gap-x-6 gap-y-1 text-lg" data-testid="print-summary">
        {sheet.briefing ? (
          <li>
            <strong>Drivers&apos; briefing</strong> {sheet.briefing.starts}–{sheet.briefing.ends}
          </li>
        ) : null}
        {sheet.lunch ? (
          <li>
            <strong>Lunch</strong> {sheet.lunch.starts}–{sheet.lunch.ends}
          </li>
        ) : null}
        <li>{sheet.cap}</li>
      </ul>
      {sheet.groups.map((g) => (
        <PrintBlock
          key={g.index}
          id={`group-${g.index}`}
          heading={`${g.name} — ${g.drives.length} ${g.drives.length === 1 ? "car" : "cars"}`}
        >
          <p className="mb-2 text-lg font-semibold" data-testid="print-sessions">
            {g.sessions.length === 0
              ? "No session fits the day."
              : g.sessions.map((s) => `Round ${s.round} ${s.starts}–${s.ends}`).join(" · ")}
          </p>
          <DriveRows drives={g.drives} />
        </PrintBlock>
      ))}
      {sheet.unplaced.length > 0 ? (
        <PrintBlock id="unplaced" heading="In no group">
          <DriveRows drives={sheet.unplaced} />
        </PrintBlock>
      ) : null}
      {sheet.notes.length > 0 ? (
        <section className="print-block space-y-1 text-base" aria-label="Notes">
          <h2 className="text-xl font-bold">Where a rule gave way</h2>
          <ul className="ml-5 list-disc">
            {sheet.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}

function DriveRows({ drives }: { drives: PrintedDrive[] }) {
  return (
    <ul className="divide-y divide-asphalt-300">
      {drives.map((d) => (
        <li
          key={d.driveId}
          className="print-row flex items-center gap-3 py-1.5"
          data-testid="print-car"
          data-car-number={d.carNumber}
        >
          <PrintCarNumber carNumber={d.carNumber} />
          <div className="min-w-0 flex-1">
            <p className="text-lg font-semibold">{d.driverName}</p>
            <p className="text-base">
              {d.className} · {experienceWords[d.experience]}
              {d.sharedWith
                ? ` · shares the car with ${d.sharedWith.driverName}${d.sharedWith.groupName ? ` (${d.sharedWith.groupName})` : ""}`
                : ""}
            </p>
          </div>
        </li>
      ))}
    </ul>
  );
}
