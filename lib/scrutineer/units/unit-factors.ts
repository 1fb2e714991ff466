/**
 * The only place unit factors live. Every conversion in Plumbline goes through these tables.
 * Values are exact where NIST SP 811 (2008) Appendix B.8 marks them exact.
 */

/** Length units Plumbline reads and shows. */
export type LengthUnit = "mm" | "cm" | "m" | "in" | "ft";
/** Mass units Plumbline reads and shows. */
export type MassUnit = "kg" | "lb";
/** Power units found on dyno sheets. */
export type PowerUnit = "kW" | "W" | "hp" | "PS";
/** Pressure units found on dyno sheets. */
export type PressureUnit = "kPa" | "hPa" | "mbar" | "inHg";
/** Temperature units found on dyno sheets. */
export type TemperatureUnit = "C" | "F";

/** Conversion factors, each "how many of the internal unit in one of this unit". */
export const UNIT_FACTORS = {
  /** Millimetres per unit. 1 in = 25.4 mm exactly; 1 ft = 12 in. */
  mmPer: { mm: 1, cm: 10, m: 1000, in: 25.4, ft: 304.8 } satisfies Record<LengthUnit, number>,
  /** Kilograms per unit. 1 lb (avoirdupois) = 0.45359237 kg exactly. */
  kgPer: { kg: 1, lb: 0.45359237 } satisfies Record<MassUnit, number>,
  /**
   * Kilowatts per unit. 1 hp (550 ft·lbf/s) = 745.69987158227 W;
   * 1 PS (metric horsepower) = 735.49875 W exactly.
   */
  kWPer: { kW: 1, W: 0.001, hp: 0.74569987158227, PS: 0.73549875 } satisfies Record<
    PowerUnit,
    number
  >,
  /** Kilopascals per unit. 1 mbar = 1 hPa = 100 Pa exactly; 1 inHg (conventional) = 3386.389 Pa. */
  kPaPer: { kPa: 1, hPa: 0.1, mbar: 0.1, inHg: 3.386389 } satisfies Record<PressureUnit, number>,
  /** Degrees Fahrenheit to Celsius: t/°C = (t/°F − 32) / 1.8 exactly. */
  fahrenheit: { offset: 32, perCelsius: 1.8 },
} as const;
