import { type TemperatureUnit, UNIT_FACTORS } from "./unit-factors";

/**
 * Converts a temperature between °C and °F (exact affine relation).
 * @param value temperature in `from` units
 * @returns temperature in `to` units
 */
export function convertTemperature(
  value: number,
  from: TemperatureUnit,
  to: TemperatureUnit,
): number {
  if (from === to) return value;
  const { offset, perCelsius } = UNIT_FACTORS.fahrenheit;
  return from === "F" ? (value - offset) / perCelsius : value * perCelsius + offset;
}
