import type { RuleSet } from "../rule-sets/rule-set-schema";
import { convertLength } from "../units/convert-length";
import { precheckWingPlan } from "./precheck-wing-plan";
import type { PlanLength, WingPlan } from "./wing-plan-schema";

/** Per class id: whether the planned wing fits that class on this car, and why in words. */
export type ClassFits = Record<string, { fits: boolean; words: string }>;

/**
 * The pre-check for one car from the garage, for the entry form's class picker: the plan's wing
 * on the car's own body width and roof height (the garage's figures win over the plan's; where
 * the garage has none the plan's figure is used and the words say so). With no plan every class
 * says the wing has not been planned, and `fits` is false: not known to fit, not known to be over.
 */
export function fitCarToClasses({
  car,
  plan,
  ruleSet,
}: {
  car: { bodyWidthMm: number | null; roofHeightMm: number | null };
  plan: WingPlan | null;
  ruleSet: RuleSet;
}): ClassFits {
  if (plan === null) {
    return Object.fromEntries(
      ruleSet.classes.map((c) => [
        c.id,
        {
          fits: false,
          words: "The wing has not been planned yet: the pre-check says which classes it fits.",
        },
      ]),
    );
  }
  const own = (mm: number | null, planned: PlanLength): PlanLength =>
    mm === null ? planned : { value: convertLength(mm, "mm", planned.unit), unit: planned.unit };
  const onCar: WingPlan = {
    ...plan,
    car: {
      ...plan.car,
      bodyWidth: own(car.bodyWidthMm, plan.car.bodyWidth),
      roofHeight: own(car.roofHeightMm, plan.car.roofHeight),
    },
  };
  const missing = [
    ...(car.bodyWidthMm === null ? ["body width"] : []),
    ...(car.roofHeightMm === null ? ["roof height"] : []),
  ];
  const note =
    missing.length === 0 ? "" : ` (the plan's ${missing.join(" and ")}: the garage has none)`;
  return Object.fromEntries(
    precheckWingPlan({ plan: onCar, ruleSet }).map((fit) => [
      fit.classId,
      { fits: fit.fits, words: `${fit.words}${note}` },
    ]),
  );
}
