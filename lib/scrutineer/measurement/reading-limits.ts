/**
 * The largest magnitude a reading may have, by what it measures, so a typing slip (or a forged
 * record) is refused at the edge instead of overflowing the arithmetic. Generous on purpose:
 * they catch nonsense, not unusual cars. Source: common practice (no source).
 */
export const READING_LIMITS = {
  /** 100 m: longer than any car (the length parser's cap too). */
  length: { max: 100_000, unit: "mm" },
  /** One corner on a scale pad; a heavy road car carries well under half of this on a corner. */
  cornerWeight: { max: 2_000, unit: "kg" },
  /** A static noise test; no car at a club event comes near it. */
  noise: { max: 150, unit: "dB(A)" },
} as const;
