import type { DynoSheet } from "../classes/entry-declarations-schema";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import { convertPower } from "../units/convert-power";
import { formatDecimal } from "../units/format-decimal";
import type { PowerUnit } from "../units/unit-factors";
import type { CorrectedPower } from "./corrected-power-kw";
import { CORRECTION_SHORT_NAMES } from "./dyno-correction-standards";

const WHERE = { wheel: "at the wheels", crank: "at the crank" } as const;

/**
 * Says how the power a class compares was had from the dyno sheet, step by step, so a
 * scrutineer can check it: "250 hp at the wheels on the sheet (STD), × 0.9615 to SAE J1349 =
 * 240.4 hp at the wheels"; "300 PS at the crank on the sheet (SAE J1349) = 295.9 hp, × 0.85 crank
 * to wheels = 251.5 hp at the wheels"; or just "200 hp at the wheels on the sheet (SAE J1349)".
 * @param powerUnit the unit of the rule's power-to-weight ratio
 */
export function describeDynoPower(args: {
  sheet: DynoSheet;
  power: Extract<CorrectedPower, { ok: true }>;
  rule: NonNullable<RuleSet["powerToWeight"]>;
  powerUnit: PowerUnit;
}): string {
  const { sheet, power, rule, powerUnit } = args;
  const onSheet = `${formatDecimal(sheet.power.value, 1)} ${sheet.power.unit} ${WHERE[sheet.measuredAt]} on the sheet (${CORRECTION_SHORT_NAMES[sheet.correction]})`;
  const steps: string[] = [];
  if (power.correctionMultiplier !== null) {
    steps.push(
      `× ${formatDecimal(power.correctionMultiplier, 4)} to ${CORRECTION_SHORT_NAMES[rule.correction]}`,
    );
  }
  if (power.crankToWheelFactor !== null) {
    const f = formatDecimal(power.crankToWheelFactor, 4);
    steps.push(sheet.measuredAt === "crank" ? `× ${f} crank to wheels` : `÷ ${f} wheels to crank`);
  }
  const sameUnit = sheet.power.unit === powerUnit;
  if (steps.length === 0 && sameUnit) return onSheet;
  const inUnit = sameUnit
    ? ""
    : ` = ${formatDecimal(convertPower(sheet.power.value, sheet.power.unit, powerUnit), 1)} ${powerUnit}`;
  const result = `${formatDecimal(convertPower(power.powerKw, "kW", powerUnit), 1)} ${powerUnit} ${WHERE[power.measuredAt]}`;
  return steps.length === 0
    ? `${onSheet}${inUnit} ${WHERE[power.measuredAt]}`
    : `${onSheet}${inUnit}, ${steps.join(", ")} = ${result}`;
}
