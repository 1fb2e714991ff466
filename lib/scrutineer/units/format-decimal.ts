/**
 * Formats a number for display with at most `maxDecimals` decimals, trailing zeros dropped,
 * no thousands separator, an ASCII minus sign, halves rounded away from zero. Never "-0".
 */
export function formatDecimal(value: number, maxDecimals: number): string {
  if (!Number.isFinite(value)) return String(value);
  const factor = 10 ** maxDecimals;
  const scaled = Math.abs(value) * factor;
  // The 1e-12 nudge makes binary noise (6.349999999999994) round as the decimal it stands for.
  const rounded = Math.round(scaled + scaled * 1e-12) / factor;
  let text = rounded.toFixed(maxDecimals);
  if (maxDecimals > 0) {
    let end = text.length;
    while (text.charCodeAt(end - 1) === 48) end -= 1; // "0"
    if (text.charCodeAt(end - 1) === 46) end -= 1; // "."
    text = text.slice(0, end);
  }
  return value < 0 && rounded !== 0 ? `-${text}` : text;
}
