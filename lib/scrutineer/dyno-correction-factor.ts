import { convertPressure } from "./convert-pressure";
import { convertTemperature } from "./convert-temperature";
import { DYNO_CORRECTION_STANDARDS } from "./dyno-correction-standards";

/**
 * The correction factor that brings observed dyno power to a standard's reference conditions
 * (corrected = observed × CF).
 * @param dryAirPressureKpa ambient pressure minus water vapour pressure, in kPa
 * @param temperatureC intake air temperature, in °C
 */
export function dynoCorrectionFactor(
  standard: "sae-j1349" | "std",
  conditions: { dryAirPressureKpa: number; temperatureC: number },
): number {
  const { dryAirPressureKpa, temperatureC } = conditions;
  if (!(dryAirPressureKpa > 0)) throw new RangeError("Dry-air pressure must be positive");
  if (standard === "sae-j1349") {
    const s = DYNO_CORRECTION_STANDARDS["sae-j1349"];
    const pMbar = convertPressure(dryAirPressureKpa, "kPa", "mbar");
    const tK = temperatureC + s.kelvinOffset;
    return (
      s.a * (s.referenceDryAirPressureMbar / pMbar) * Math.sqrt(tK / s.referenceTemperatureK) + s.b
    );
  }
  const s = DYNO_CORRECTION_STANDARDS.std;
  const pInHg = convertPressure(dryAirPressureKpa, "kPa", "inHg");
  const tR = convertTemperature(temperatureC, "C", "F") + s.rankineOffset;
  return (s.referencePressureInHg / pInHg) * Math.sqrt(tR / s.referenceTemperatureR);
}
