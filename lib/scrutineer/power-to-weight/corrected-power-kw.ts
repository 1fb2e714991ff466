import { addYearsToDate } from "../calendar/add-years-to-date";
import type { DynoSheet } from "../classes/entry-declarations-schema";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import { convertPower } from "../units/convert-power";
import { convertPressure } from "../units/convert-pressure";
import { convertTemperature } from "../units/convert-temperature";
import { dynoAmbientProblem } from "./dyno-ambient-problem";
import { dynoCorrectionFactor } from "./dyno-correction-factor";
import { CORRECTION_NAMES } from "./dyno-correction-standards";

type PowerRule = NonNullable<RuleSet["powerToWeight"]>;

/** The power figure the class compares, or why it cannot be had yet. */
export type CorrectedPower =
  | {
      ok: true;
      powerKw: number;
      /** What the sheet's figure was multiplied by to reach the rule's correction standard
       * (CF_rule / CF_sheet), or null when the sheet already used it. */
      correctionMultiplier: number | null;
      /** The rule's crank-to-wheel factor when it was used (crank × f = wheel), else null. */
      crankToWheelFactor: number | null;
      measuredAt: "wheel" | "crank";
    }
  | { ok: false; missing: string[]; reason: string };

/**
 * Brings a declared dyno figure to the basis the rule set asks for: the required correction
 * standard (re-correcting through observed power with the sheet's pressure and temperature when
 * the sheet used another), and wheel or crank power (only when the rule gives a conversion factor).
 * A sheet dated after the event day, older than the rule's validity on the event date, or whose
 * printed pressures cannot be true ({@link dynoAmbientProblem}: a sheet saved before they were
 * checked) is not accepted, with the reason in words; this never throws.
 * @param eventDate ISO date of the event (venue-local)
 */
export function correctedPowerKw(
  sheet: DynoSheet | null,
  rule: PowerRule,
  eventDate: string,
): CorrectedPower {
  if (sheet === null) {
    return { ok: false, missing: ["dyno sheet"], reason: "waiting for the dyno sheet" };
  }
  if (sheet.date > eventDate) {
    return {
      ok: false,
      missing: ["a dyno sheet dated on or before the event day"],
      reason: `the dyno sheet is dated ${sheet.date}, after the event day (${eventDate}); it is not accepted — check the date on the sheet`,
    };
  }
  if (
    rule.dynoSheetValidYears !== null &&
    addYearsToDate(sheet.date, rule.dynoSheetValidYears) < eventDate
  ) {
    return {
      ok: false,
      missing: ["a current dyno sheet"],
      reason: `the dyno sheet dated ${sheet.date} is older than ${rule.dynoSheetValidYears} years; a current sheet is needed`,
    };
  }
  const refuse = (problem: string): CorrectedPower => ({
    ok: false,
    missing: ["a dyno sheet whose figures can be true"],
    reason: `the dyno sheet cannot be true: ${problem}; it is not accepted — check the figures on the sheet`,
  });
  const ambientProblem = sheet.ambient === null ? null : dynoAmbientProblem(sheet.ambient);
  if (ambientProblem !== null) return refuse(ambientProblem);
  const sheetKw = convertPower(sheet.power.value, sheet.power.unit, "kW");
  let powerKw = sheetKw;
  let correctionMultiplier: number | null = null;
  let crankToWheelFactor: number | null = null;
  if (sheet.correction !== rule.correction) {
    if (sheet.ambient === null) {
      return {
        ok: false,
        missing: ["dyno sheet pressure and temperature"],
        reason: `the dyno sheet is ${CORRECTION_NAMES[sheet.correction]} and gives no pressure and temperature to bring it to ${CORRECTION_NAMES[rule.correction]}`,
      };
    }
    const { pressure, vapourPressure, temperature } = sheet.ambient;
    const dryAirPressureKpa =
      convertPressure(pressure.value, pressure.unit, "kPa") -
      (vapourPressure === undefined
        ? 0
        : convertPressure(vapourPressure.value, vapourPressure.unit, "kPa"));
    const conditions = {
      dryAirPressureKpa,
      temperatureC: convertTemperature(temperature.value, temperature.unit, "C"),
    };
    const fromSheet =
      sheet.correction === "uncorrected"
        ? ({ ok: true, factor: 1 } as const)
        : dynoCorrectionFactor(sheet.correction, conditions);
    if (!fromSheet.ok) return refuse(fromSheet.problem);
    const toRule =
      rule.correction === "uncorrected"
        ? ({ ok: true, factor: 1 } as const)
        : dynoCorrectionFactor(rule.correction, conditions);
    if (!toRule.ok) return refuse(toRule.problem);
    powerKw = (powerKw / fromSheet.factor) * toRule.factor;
    correctionMultiplier = powerKw / sheetKw;
  }
  if (sheet.measuredAt !== rule.powerMeasuredAt) {
    if (rule.crankToWheelFactor === null) {
      return {
        ok: false,
        missing: [`${rule.powerMeasuredAt} power figure`],
        reason: `the dyno sheet gives ${sheet.measuredAt} power; this rule set needs ${rule.powerMeasuredAt} power`,
      };
    }
    crankToWheelFactor = rule.crankToWheelFactor;
    powerKw =
      sheet.measuredAt === "crank"
        ? powerKw * rule.crankToWheelFactor
        : powerKw / rule.crankToWheelFactor;
  }
  return {
    ok: true,
    powerKw,
    correctionMultiplier,
    crankToWheelFactor,
    measuredAt: rule.powerMeasuredAt,
  };
}
