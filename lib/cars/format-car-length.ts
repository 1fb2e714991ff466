import { convertLength } from "../scrutineer/units/convert-length";

/** A car's stored length as its owner reads it: "1638.3 mm (64.5 in)". */
export function formatCarLength(mm: number): string {
  const inches = Math.round(convertLength(mm, "mm", "in") * 10) / 10;
  return `${Math.round(mm * 10) / 10} mm (${inches} in)`;
}

/** A stored length as text the form takes back unchanged: "1638.3 mm"; empty when not given. */
export function carLengthText(mm: number | null): string {
  return mm === null ? "" : `${Math.round(mm * 10) / 10} mm`;
}
