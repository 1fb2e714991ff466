import { CORRECTION_NAMES } from "../power-to-weight/dyno-correction-standards";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import { formatDecimal } from "../units/format-decimal";
import type { ClassRules } from "./class-rules-schema";

/** A part of the declarations form. */
export type DeclarationTopic = "weight" | "power" | "tyres" | "modifications" | "engine" | "aero";

/** Whether the declared class asks for a topic, and why, in words an entrant can act on. */
export type DeclarationAsk = { topic: DeclarationTopic; asked: boolean; why: string };

/**
 * What a class asks the entrant to declare, read from its rules and the rule set's
 * power-to-weight rule: a power-to-weight floor needs the dyno sheet (with the standard it is
 * corrected to and the ambient conditions printed on it) and, when the car is weighed on a
 * different basis than the rule, the driver's weight; a treadwear floor needs the tyres; a
 * points budget the modification points; a displacement limit the engine. Aero devices are
 * always asked: every class rules on them. Pure.
 */
export function declarationAsks(cls: ClassRules, ruleSet: RuleSet): DeclarationAsk[] {
  const p2w = ruleSet.powerToWeight;
  const powerAsked = cls.minPowerToWeight !== null && p2w !== null;
  const weightWhy = (): string => {
    if (!powerAsked || p2w === null) {
      return `${cls.name} has no power-to-weight limit, so your weight is not needed.`;
    }
    const basis =
      p2w.weightBasis === "with-driver"
        ? "weighs the car with the driver aboard"
        : "weighs the car without the driver";
    const driver =
      p2w.driverMass.kind === "fixed"
        ? `where the car is weighed the other way, the rule uses a fixed ${formatDecimal(p2w.driverMass.kg, 1)} kg for the driver, so your own weight is not needed`
        : "where the car is weighed the other way, your declared weight (in your kit) is added or taken off";
    const ballast = p2w.ballastCounts
      ? "Ballast on the scales counts toward the weight."
      : "Ballast is taken off the weight: declare how much is fitted.";
    return `The power-to-weight rule ${basis}; ${driver}. ${ballast}`;
  };
  const powerWhy = (): string => {
    if (!powerAsked || p2w === null) {
      return `${cls.name} has no power-to-weight limit, so no dyno sheet is needed.`;
    }
    const at = p2w.powerMeasuredAt === "wheel" ? "at the wheels" : "at the crank";
    const expiry =
      p2w.dynoSheetValidYears !== null
        ? ` The sheet must be less than ${p2w.dynoSheetValidYears} years old on the event date.`
        : "";
    return `${cls.name} needs at least ${formatDecimal(cls.minPowerToWeight ?? 0, 2)} ${p2w.unit}: give the power from your dyno sheet, measured ${at}, ${CORRECTION_NAMES[p2w.correction]}. A sheet corrected to another standard is converted with the air pressure and temperature it prints.${expiry}`;
  };
  return [
    { topic: "weight", asked: powerAsked, why: weightWhy() },
    { topic: "power", asked: powerAsked, why: powerWhy() },
    {
      topic: "tyres",
      asked: cls.minTreadwear !== null,
      why:
        cls.minTreadwear !== null
          ? `${cls.name} needs tyres with a treadwear grade of at least ${cls.minTreadwear}; a tyre with no grade (a race tyre) does not qualify.`
          : `${cls.name} sets no treadwear floor.`,
    },
    {
      topic: "modifications",
      asked: cls.maxModificationPoints !== null,
      why:
        cls.maxModificationPoints !== null
          ? `${cls.name} allows at most ${formatDecimal(cls.maxModificationPoints, 1)} modification points: add up your car's points from the rulebook's table.`
          : `${cls.name} sets no modification points budget.`,
    },
    {
      topic: "engine",
      asked: cls.maxEffectiveDisplacementCc !== null,
      why:
        cls.maxEffectiveDisplacementCc !== null
          ? `${cls.name} allows at most ${formatDecimal(cls.maxEffectiveDisplacementCc, 0)} cc${ruleSet.forcedInductionMultiplier !== null ? `, a turbo or supercharged engine counting ${formatDecimal(ruleSet.forcedInductionMultiplier, 2)} × its displacement` : ""}.`
          : `${cls.name} sets no displacement limit.`,
    },
    {
      topic: "aero",
      asked: true,
      why: `Say which aero devices are fitted: the tech line measures each against ${cls.name}'s limits.`,
    },
  ];
}
