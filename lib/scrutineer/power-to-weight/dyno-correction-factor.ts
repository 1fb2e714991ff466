import { convertPressure } from "../units/convert-pressure";
import { convertTemperature } from "../units/convert-temperature";
import { DYNO_CORRECTION_STANDARDS } from "./dyno-correction-standards";

/** A correction factor, or why the conditions give none. */
export type DynoCorrection = { ok: true; factor: number } | { ok: false; problem: string };

/**
 * The correction factor that brings observed dyno power to a standard's reference conditions
 * (corrected = observed × CF). Never throws: conditions no correction can use (no dry air left,
 * a temperature at or below absolute zero, or a factor that is not a positive finite number)
 * come back as a problem in words, which the verdict explains.
 * @param dryAirPressureKpa ambient pressure minus water vapour pressure, in kPa
 * @param temperatureC intake air temperature, in °C
 */
export function dynoCorrectionFactor(
  standard: "sae-j1349" | "std",
  conditions: { dryAirPressureKpa: number; temperatureC: number },
): DynoCorrection {
  const { dryAirPressureKpa, temperatureC } = conditions;
  if (!(dryAirPressureKpa > 0)) {
    return { ok: false, problem: "its pressures leave no dry air (air minus vapour pressure)" };
  }
  let factor: number;
  if (standard === "sae-j1349") {
    const s = DYNO_CORRECTION_STANDARDS["sae-j1349"];
    const pMbar = convertPressure(dryAirPressureKpa, "kPa", "mbar");
    const tK = temperatureC + s.kelvinOffset;
    factor =
      s.a * (s.referenceDryAirPressureMbar / pMbar) * Math.sqrt(tK / s.referenceTemperatureK) + s.b;
  } else {
    const s = DYNO_CORRECTION_STANDARDS.std;
    const pInHg = convertPressure(dryAirPressureKpa, "kPa", "inHg");
    const tR = convertTemperature(temperatureC, "C", "F") + s.rankineOffset;
    factor = (s.referencePressureInHg / pInHg) * Math.sqrt(tR / s.referenceTemperatureR);
  }
  if (!(Number.isFinite(factor) && factor > 0)) {
    return { ok: false, problem: "its pressure and temperature give no usable correction factor" };
  }
  return { ok: true, factor };
}
