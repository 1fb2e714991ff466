/**
 * Reference conditions of the dyno correction standards, as the formulas are quoted in dyno
 * literature. Kept as data in one place like the unit factors.
 * - SAE J1349 (JUN90): 99 kPa dry air (990 mbar), 25 °C;
 *   CF = 1.18 × (990 / Pd[mbar]) × √((T[°C] + 273) / 298) − 0.18.
 * - The older standard-day "STD" correction: 29.92 inHg, 60 °F;
 *   CF = (29.92 / P[inHg]) × √((T[°F] + 460) / 520). It reads about 4 % higher than J1349.
 */
export const DYNO_CORRECTION_STANDARDS = {
  "sae-j1349": {
    name: "SAE J1349",
    referenceDryAirPressureMbar: 990,
    kelvinOffset: 273,
    referenceTemperatureK: 298,
    /** CF = a × (pressure ratio) × √(temperature ratio) + b */
    a: 1.18,
    b: -0.18,
  },
  std: {
    name: "STD (29.92 inHg, 60 °F)",
    referencePressureInHg: 29.92,
    rankineOffset: 460,
    referenceTemperatureR: 520,
  },
} as const;

/** Names for the correction options a rule set or a dyno sheet states. */
export const CORRECTION_NAMES = {
  "sae-j1349": DYNO_CORRECTION_STANDARDS["sae-j1349"].name,
  std: DYNO_CORRECTION_STANDARDS.std.name,
  uncorrected: "uncorrected (observed)",
} as const;

/** Short names for the correction options, for use inside a reason's parentheses. */
export const CORRECTION_SHORT_NAMES = {
  "sae-j1349": DYNO_CORRECTION_STANDARDS["sae-j1349"].name,
  std: "STD",
  uncorrected: "uncorrected",
} as const;
