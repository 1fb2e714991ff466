/**
 * What a car's own figures can plausibly be, in millimetres. The garage refuses a figure outside
 * these (a width typed in inches but read as millimetres lands far below the floor); they are not
 * class limits, which live in the event's rule set.
 * - Body width: no road vehicle may be wider than 2,550 mm in the EU and UK (Council Directive
 *   96/53/EC, Annex I 1.1); the narrowest cars that come to a track day (a Seven-type kit car,
 *   a Kei car) are about 1,400–1,480 mm wide: floor 1,200 mm — common practice (no source).
 * - Roof height: a Ford GT40 stands about 1,030 mm (40 in) high — from memory; floor 900 mm; a
 *   tall van about 2,500 mm — common practice (no source).
 */
export const CAR_SIZE_LIMITS = {
  bodyWidthMm: { min: 1200, max: 2550 },
  roofHeightMm: { min: 900, max: 2500 },
} as const;

/** The earliest model year the garage takes: cars older than 1900 are not track-day cars. */
export const EARLIEST_MODEL_YEAR = 1900;

/**
 * The latest model year the garage takes in a given calendar year: next year's. Makers sell a
 * model year ahead of the calendar (a model year may start on 2 January of the year before:
 * 40 CFR 85.2302, from memory), so a car bought new this autumn can be next year's model; a year
 * beyond that cannot exist yet.
 */
export function latestModelYear(thisYear: number): number {
  return thisYear + 1;
}
