/**
 * Formats a number for display with at most `maxDecimals` decimals, trailing zeros dropped,
 * no thousands separator, an ASCII minus sign, halves rounded away from zero. Never "-0".
 */
export function formatDecimal(value: number, maxDecimals: number): string {
  if (!Number.isFinite(value)) return String(value);
  const factor = 10 ** maxDecimals;
  // toPrecision(12) first, so binary noise (6.349999999999994) rounds as the decimal it stands for.
  const rounded = Math.round(Number((Math.abs(value) * factor).toPrecision(12))) / factor;
  const fixed = rounded.toFixed(maxDecimals);
  const text = fixed.includes(".") ? fixed.replace(/0+$/, "").replace(/\.$/, "") : fixed;
  return value < 0 && rounded !== 0 ? `-${text}` : text;
}
