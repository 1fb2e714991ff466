/** A car's number as a dark chip, the first thing read in every list of cars. */
export function CarNumberChip({
  carNumber,
  small = false,
}: {
  carNumber: number;
  small?: boolean;
}) {
  return (
    <span
      className={`tabular min-w-14 rounded-md bg-asphalt-950 px-2 text-center font-bold text-asphalt-50 ${
        small ? "text-xl" : "py-1 text-2xl"
      }`}
    >
      {carNumber}
    </span>
  );
}
