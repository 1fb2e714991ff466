import type { FlaggedDrive } from "@/lib/run-sheet/clerk-view";
import { PrintBlock } from "./print-block";
import { PrintCarNumber } from "./print-car-number";

/** Cars on the printed version that may no longer run, and why: printed above the groups. */
export function FlaggedDrivesBlock({ flagged }: { flagged: FlaggedDrive[] }) {
  if (flagged.length === 0) return null;
  const byEntry = [...new Map(flagged.map((f) => [f.entryId, f])).values()];
  return (
    <PrintBlock id="flagged" heading="Since this version was published: may not run">
      <ul className="space-y-1" data-testid="print-flagged">
        {byEntry.map((f) => (
          <li key={f.entryId} className="print-row flex items-center gap-3 text-lg">
            <PrintCarNumber carNumber={f.carNumber} />
            <span>{f.why}</span>
          </li>
        ))}
      </ul>
    </PrintBlock>
  );
}
