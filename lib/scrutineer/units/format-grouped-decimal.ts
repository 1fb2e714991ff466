import { formatDecimal } from "./format-decimal";

/**
 * Like {@link formatDecimal}, with a comma between thousands, for numbers people read aloud
 * in a warning: 99999 → "99,999", 1638.3 → "1,638.3".
 */
export function formatGroupedDecimal(value: number, maxDecimals: number): string {
  const text = formatDecimal(value, maxDecimals);
  const match = /^(-?)(\d+)(.*)$/.exec(text);
  if (match === null) return text;
  const [, sign, whole = "", rest] = match;
  return `${sign}${whole.replace(/\B(?=(\d{3})+(?!\d))/g, ",")}${rest}`;
}
