import type { FlaggedDrive } from "@/lib/run-sheet/clerk-view";
import { CarNumberChip } from "../car-number-chip";
import { StoppedIcon } from "../icons/state-icons";

/** Cars on the published run sheet that may no longer run (held, withdrawn, sent back). */
export function FlaggedList({ flagged }: { flagged: FlaggedDrive[] }) {
  if (flagged.length === 0) return null;
  return (
    <section
      className="space-y-2 rounded-xl border-2 border-stopped-line bg-stopped-soft p-4 text-stopped"
      aria-labelledby="flagged-heading"
      data-testid="flagged"
    >
      <h2 id="flagged-heading" className="flex items-center gap-2 text-xl font-bold">
        <StoppedIcon className="size-6 shrink-0" />
        On the published run sheet, but may not run now
      </h2>
      <ul className="space-y-1">
        {flagged.map((f) => (
          <li key={f.driveId} className="flex flex-wrap items-center gap-2 text-base font-semibold">
            <CarNumberChip carNumber={f.carNumber} small />
            {f.why}
          </li>
        ))}
      </ul>
      <p className="text-base">
        Keep these cars off track. Move them out and publish a new version, or wait for the chief
        scrutineer.
      </p>
    </section>
  );
}
