import type { DisplayLengthUnit } from "@/lib/scrutineer/units/format-length";

/** How one limit stands: the verdict's rule outcome, less "not-applicable". */
export type EnvelopeOutcome = "pass" | "fail" | "inconclusive" | "waiting";

/** One limit of the class and where the car stands against it, all lengths in mm. */
export type EnvelopeCheck = {
  /** The class's limit; null when the class sets none (unlimited). */
  limitMm: number | null;
  /** The measured quantity the limit applies to; null when not measured yet. */
  measuredMm: number | null;
  outcome: EnvelopeOutcome;
  /**
   * The margin in the event's unit as the verdict words it (`RuleResult.marginText`,
   * "over by 2 mm"); when absent it is worded here from the two numbers.
   */
  marginText?: string | null;
  /** Expanded uncertainty U = k·u of the reading, in mm; worded into an "unsure" margin. */
  uncertaintyMm?: number | null;
};

/** The wing's top: above the roof's highest point (the usual rule) or above the ground. */
export type EnvelopeHeightCheck = EnvelopeCheck & { reference: "roof-peak" | "ground" };

/**
 * The span rule: `limitMm` is the allowance over the body width (0 = no wider than the body),
 * `measuredMm` is span − body width (less both end plates when the rule does not count them),
 * as the verdict's wing-span rule carries them. The two widths are for the labels.
 */
export type EnvelopeSpanCheck = EnvelopeCheck & {
  wingSpanMm: number | null;
  bodyWidthMm: number | null;
  endPlatesCounted: boolean;
};

/** Props of ClassEnvelope. Plain data: see envelopeFromClassCheck to feed it from a Verdict. */
export type ClassEnvelopeProps = {
  /** The class's name, as the rule set has it. */
  classLabel: string;
  /** The event's display unit; every number on the drawing is in it. */
  unit: DisplayLengthUnit;
  height: EnvelopeHeightCheck;
  overhang: EnvelopeCheck;
  span: EnvelopeSpanCheck;
  /** Listed with the others; not drawn (the side view has no room to show a chord honestly). */
  chord?: EnvelopeCheck | null;
  className?: string;
};
