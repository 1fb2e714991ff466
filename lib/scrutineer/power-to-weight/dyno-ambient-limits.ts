/**
 * What the ambient conditions printed on a dyno sheet can be, so a sheet that cannot be true is
 * refused instead of correcting power by a nonsense factor.
 * - Air pressure is the station (absolute) pressure in the dyno cell, in hPa (= mbar).
 *   Highest: 1,100 hPa, above the highest sea-level pressure ever recorded, 1,083.8 hPa at Agata,
 *   Russia, on 31 Dec 1968 (WMO World Weather & Climate Extremes Archive), and above the about
 *   1,065 hPa a cell on the Dead Sea shore (−430 m) reads on an ordinary day (ISO 2533:1975
 *   standard atmosphere). Lowest: 500 hPa, below the standard atmosphere at 5,100 m, the height
 *   of the highest towns (about 533 hPa, ISO 2533:1975), with room for a deep low (the lowest
 *   sea-level pressure on record is 870 hPa, Typhoon Tip, 1979, WMO archive: about 14 % below
 *   standard).
 * - Vapour pressure is below the air pressure (dry air = air − vapour must be left) and at most
 *   the saturation vapour pressure over water at the sheet's temperature,
 *   e_w(t) = 6.112 × exp(17.62 t / (243.12 + t)) hPa (WMO-No. 8, Guide to Meteorological
 *   Instruments and Methods of Observation, Annex 4.B), with 5 % for the sensor.
 */
export const DYNO_AMBIENT_LIMITS = {
  airPressureHpa: { min: 500, max: 1100 },
  saturation: { a: 6.112, b: 17.62, c: 243.12, allowance: 1.05 },
} as const;
