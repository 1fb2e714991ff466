import type { DisplayUnits } from "../units/display-units";
import { displayResolution, formatQuantity, showsAsZero } from "../units/format-quantity";
import type { RuleUnit } from "../verdicts/verdict-schema";

/**
 * Says how far a reading is from its limit, in the event's units: "53 mm inside",
 * "over by 2 mm", "short by 0.2 lb/hp", "exactly on the limit", or for a guarded-acceptance
 * doubt "over by 1 mm, less than the ± 2.8 mm uncertainty".
 * @param marginToLimit positive inside, negative beyond, in `unit`
 */
export function describeMargin(args: {
  outcome: "pass" | "fail" | "inconclusive";
  marginToLimit: number;
  side: "max" | "min";
  unit: RuleUnit;
  display: DisplayUnits;
  expandedUncertainty?: number;
}): string {
  const { outcome, marginToLimit, side, unit, display } = args;
  const size = Math.abs(marginToLimit);
  const amount =
    size !== 0 && showsAsZero(size, unit, display)
      ? `less than ${displayResolution(unit, display)}`
      : formatQuantity(size, unit, display);
  const beyond = side === "max" ? "over by" : "short by";
  if (marginToLimit === 0 && outcome !== "inconclusive") return "exactly on the limit";
  const plain = marginToLimit > 0 ? `${amount} inside` : `${beyond} ${amount}`;
  if (outcome !== "inconclusive" || args.expandedUncertainty === undefined) return plain;
  const u = formatQuantity(args.expandedUncertainty, unit, display);
  const where = marginToLimit === 0 ? "exactly on the limit" : plain;
  return `${where}; the ± ${u} uncertainty leaves it undecided`;
}
