import type { DynoAmbient } from "../classes/entry-declarations-schema";
import { convertPressure } from "../units/convert-pressure";
import { convertTemperature } from "../units/convert-temperature";
import { formatDecimal } from "../units/format-decimal";
import { formatGroupedDecimal } from "../units/format-grouped-decimal";
import type { PressureUnit } from "../units/unit-factors";
import { DYNO_AMBIENT_LIMITS } from "./dyno-ambient-limits";

const UNIT_WORDS: Record<PressureUnit, string> = {
  kPa: "kPa",
  hPa: "hPa",
  mbar: "mbar",
  inHg: "inHg",
};
const DECIMALS: Record<PressureUnit, number> = { kPa: 2, hPa: 1, mbar: 1, inHg: 2 };

const say = (p: { value: number; unit: PressureUnit }) =>
  `${formatGroupedDecimal(p.value, DECIMALS[p.unit])} ${UNIT_WORDS[p.unit]}`;

/**
 * Why the ambient conditions printed on a dyno sheet cannot be true, in words that name the
 * figure ("its air pressure 2,000 mbar is outside what weather and altitude give (500–1,100
 * hPa)"), or null when they can be ({@link DYNO_AMBIENT_LIMITS}). The range is said in the
 * sheet's own unit. Used by the declarations schema (refuse at the edge) and by the engine (a
 * sheet stored before the check is refused in the verdict, never thrown).
 */
export function dynoAmbientProblem(ambient: DynoAmbient): string | null {
  const { pressure, vapourPressure, temperature } = ambient;
  const airHpa = convertPressure(pressure.value, pressure.unit, "hPa");
  const { min, max } = DYNO_AMBIENT_LIMITS.airPressureHpa;
  if (!Number.isFinite(airHpa) || airHpa < min || airHpa > max) {
    const [lo, hi] = [min, max].map((x) =>
      formatGroupedDecimal(convertPressure(x, "hPa", pressure.unit), DECIMALS[pressure.unit]),
    );
    return `its air pressure ${say(pressure)} is outside what weather and altitude give (${lo}–${hi} ${UNIT_WORDS[pressure.unit]})`;
  }
  if (vapourPressure === undefined) return null;
  const vapourHpa = convertPressure(vapourPressure.value, vapourPressure.unit, "hPa");
  if (!(vapourHpa < airHpa)) {
    return `its vapour pressure ${say(vapourPressure)} is not below its air pressure ${say(pressure)}, which leaves no dry air`;
  }
  const t = convertTemperature(temperature.value, temperature.unit, "C");
  const s = DYNO_AMBIENT_LIMITS.saturation;
  const saturationHpa = s.a * Math.exp((s.b * t) / (s.c + t));
  if (vapourHpa > saturationHpa * s.allowance) {
    const most = convertPressure(saturationHpa, "hPa", vapourPressure.unit);
    return `its vapour pressure ${say(vapourPressure)} is more than air at ${formatDecimal(temperature.value, 1)} °${temperature.unit} can hold (${say({ value: most, unit: vapourPressure.unit })})`;
  }
  return null;
}
