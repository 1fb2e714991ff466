import type { RuleId } from "./rule-ids";

/** Short names of the rules, for lists and mid-sentence use. */
export const RULE_TITLES: Record<RuleId, string> = {
  "wing-allowed": "wing allowed",
  "wing-height": "wing height",
  "wing-overhang": "wing overhang",
  "wing-span": "wing span",
  "wing-chord": "wing chord",
  "splitter-allowed": "splitter allowed",
  "splitter-protrusion": "splitter protrusion",
  "splitter-width": "splitter width",
  "diffuser-allowed": "diffuser allowed",
  "power-to-weight": "power-to-weight",
  "tyre-treadwear": "tyre treadwear",
  "modification-points": "modification points",
  displacement: "displacement",
  noise: "noise",
};
