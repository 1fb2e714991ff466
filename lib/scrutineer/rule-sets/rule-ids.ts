/** Rules checked per class; a failure moves the car up or stops it, as the rule set says. */
export const CLASS_RULE_IDS = [
  "wing-allowed",
  "wing-height",
  "wing-overhang",
  "wing-span",
  "wing-chord",
  "splitter-allowed",
  "splitter-protrusion",
  "splitter-width",
  "diffuser-allowed",
  "power-to-weight",
  "tyre-treadwear",
  "modification-points",
  "displacement",
] as const;
/** One of {@link CLASS_RULE_IDS}. */
export type ClassRuleId = (typeof CLASS_RULE_IDS)[number];

/** Rules checked once for the event, whatever the class; a failure always stops the car. */
export const EVENT_RULE_IDS = ["noise"] as const;
/** One of {@link EVENT_RULE_IDS}. */
export type EventRuleId = (typeof EVENT_RULE_IDS)[number];

/** Any rule id that appears in a verdict. */
export type RuleId = ClassRuleId | EventRuleId;
