/** Cars per km of circuit when the organizer sets none. */
export const defaultCarsPerKm = 8;
/** Where the default density comes from (kept short: it is printed beside the cap). */
export const defaultCarsPerKmSource =
  "common practice (no source): club track days run roughly 6–13 cars per km of circuit; the venue's licence and the sanctioning body's rules decide";

/**
 * Cars allowed in one group. An explicit number from the organizer wins; otherwise the track length
 * in km times a density in cars per km (the organizer's, or `defaultCarsPerKm`), rounded down, at
 * least 1. `carsPerKm` may come as the database's decimal string ("7.5").
 */
export function groupCap({
  maxCarsOnTrack,
  trackLengthM,
  carsPerKm,
}: {
  maxCarsOnTrack?: number | null;
  trackLengthM?: number | null;
  carsPerKm?: number | string | null;
}): { cars: number; source: string } {
  if (maxCarsOnTrack != null && Number.isInteger(maxCarsOnTrack) && maxCarsOnTrack >= 1)
    return { cars: maxCarsOnTrack, source: `${maxCarsOnTrack} cars: set by the organizer` };
  if (trackLengthM == null || !(trackLengthM > 0))
    throw new Error("Set the cars allowed on track, or the track length to derive it from.");
  const given = carsPerKm == null || carsPerKm === "" ? Number.NaN : Number(carsPerKm);
  const density = given > 0 ? given : defaultCarsPerKm;
  const km = trackLengthM / 1000;
  // The small epsilon keeps 3.2 km × 7.5 = 24 from flooring to 23 through binary rounding.
  const cars = Math.max(1, Math.floor(km * density + 1e-9));
  const why = given > 0 ? "density set by the organizer" : defaultCarsPerKmSource;
  return {
    cars,
    source: `${cars} cars: ${km} km × ${density} cars per km, rounded down (${why})`,
  };
}
