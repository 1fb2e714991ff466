import { describeMargin } from "@/lib/scrutineer/measurement/describe-margin";
import { displayUnits } from "@/lib/scrutineer/units/display-units";
import type { DisplayLengthUnit } from "@/lib/scrutineer/units/format-length";
import type { EnvelopeCheck } from "./envelope-types";

/**
 * The margin as written on the drawing: the verdict's own words when given, otherwise worded
 * by the engine's describeMargin from the numbers, in the event's unit.
 */
export function envelopeMarginText(check: EnvelopeCheck, unit: DisplayLengthUnit): string {
  if (check.limitMm === null) return "no limit in this class";
  if (check.measuredMm === null || check.outcome === "waiting") return "not measured yet";
  if (check.marginText) return check.marginText;
  return describeMargin({
    outcome: check.outcome,
    marginToLimit: check.limitMm - check.measuredMm,
    side: "max",
    unit: "mm",
    display: displayUnits({ length: unit }),
    ...(check.outcome === "inconclusive" && typeof check.uncertaintyMm === "number"
      ? { expandedUncertainty: check.uncertaintyMm }
      : {}),
  });
}
