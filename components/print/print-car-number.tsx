/** A car's number as printed: large, bold, tabular, black on white (reads across a paddock). */
export function PrintCarNumber({ carNumber }: { carNumber: number }) {
  return (
    <span
      className="tabular inline-block min-w-[3ch] rounded-md border-4 border-asphalt-950 px-1 text-center text-4xl font-bold leading-tight"
      data-testid="print-car-number"
    >
      {carNumber}
    </span>
  );
}
