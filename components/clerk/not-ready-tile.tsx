"use client";

/** A car in the draft that may no longer run (sent back, held, withdrawn): its number, why, and
 *  one button that takes it out of the run groups. */
export function NotReadyTile({
  driveId,
  carNumber,
  why,
  onTakeOut,
}: {
  driveId: string;
  carNumber: number | null;
  why: string;
  onTakeOut: (driveId: string) => void;
}) {
  return (
    <li
      className="rounded-lg border-2 border-stopped-line bg-stopped-soft p-3 text-stopped"
      data-testid="not-ready-tile"
      data-car-number={carNumber ?? undefined}
    >
      <p className="text-lg font-semibold">
        {carNumber === null ? "A withdrawn car" : `Car ${carNumber}`} may not run now
      </p>
      <p className="text-base">{why}</p>
      <button type="button" className="btn-secondary mt-2" onClick={() => onTakeOut(driveId)}>
        Take car {carNumber ?? ""} out of the run groups
      </button>
    </li>
  );
}
