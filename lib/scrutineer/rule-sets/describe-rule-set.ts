import type { ClassRules } from "../classes/class-rules-schema";
import type { ExpiryPolicy } from "../safety/safety-rules-schema";
import type { DisplayUnits } from "../units/display-units";
import { formatDecimal } from "../units/format-decimal";
import { formatLength } from "../units/format-length";
import type { RuleSet } from "./rule-set-schema";
import { RULE_TITLES } from "./rule-titles";

/** One line of a class's limits as a person reads them: "Wing" — "top at most 100 mm above…". */
export type LimitLine = { label: string; value: string };

/** A rule set in words, for the organizer's page and anyone checking what a class allows. */
export type RuleSetDescription = {
  classes: Array<{ id: string; name: string; description: string | null; lines: LimitLine[] }>;
  general: LimitLine[];
  standards: Array<{ name: string; item: string; expiry: string; source: string | null }>;
};

function wingLine(cls: ClassRules, display: DisplayUnits): string {
  const wing = cls.aero.wing;
  if (!wing.allowed) return "not allowed";
  const len = (mm: number) => formatLength(mm, display.length);
  const parts: string[] = [];
  if (wing.height !== null) {
    parts.push(
      wing.height.reference === "roof-peak"
        ? `top at most ${len(wing.height.maxMm)} above the roof's highest point`
        : `top at most ${len(wing.height.maxMm)} from the ground`,
    );
  }
  if (wing.maxOverhangMm !== null) {
    parts.push(
      wing.maxOverhangMm === 0
        ? "not behind the rearmost bodywork"
        : `at most ${len(wing.maxOverhangMm)} behind the rearmost bodywork`,
    );
  }
  if (wing.span !== null) {
    const allowance =
      wing.span.allowanceOverBodyMm === 0
        ? "no wider than the body"
        : `no more than ${len(wing.span.allowanceOverBodyMm)} wider than the body`;
    parts.push(
      `${allowance} (end plates ${wing.span.endPlatesCounted ? "counted" : "not counted"})`,
    );
  }
  if (wing.maxChordMm !== null) parts.push(`chord at most ${len(wing.maxChordMm)}`);
  return parts.length === 0 ? "allowed, no limits" : parts.join("; ");
}

function splitterLine(cls: ClassRules, display: DisplayUnits): string {
  const splitter = cls.aero.splitter;
  if (!splitter.allowed) return "not allowed";
  const len = (mm: number) => formatLength(mm, display.length);
  const parts: string[] = [];
  if (splitter.maxProtrusionMm !== null) {
    parts.push(`at most ${len(splitter.maxProtrusionMm)} ahead of the bumper`);
  }
  if (splitter.width !== null) {
    parts.push(
      splitter.width.allowanceOverBodyMm === 0
        ? "no wider than the body"
        : `no more than ${len(splitter.width.allowanceOverBodyMm)} wider than the body`,
    );
  }
  return parts.length === 0 ? "allowed, no limits" : parts.join("; ");
}

function classLines(cls: ClassRules, ruleSet: RuleSet, display: DisplayUnits): LimitLine[] {
  const lines: LimitLine[] = [
    { label: "Wing", value: wingLine(cls, display) },
    { label: "Splitter", value: splitterLine(cls, display) },
    { label: "Diffuser", value: cls.aero.diffuserAllowed ? "allowed" : "not allowed" },
  ];
  const ptw = ruleSet.powerToWeight;
  if (cls.minPowerToWeight !== null && ptw !== null) {
    lines.push({
      label: "Power-to-weight",
      value: `at least ${formatDecimal(cls.minPowerToWeight, 2)} ${ptw.unit}`,
    });
  }
  if (cls.minTreadwear !== null) {
    lines.push({
      label: "Tyres",
      value: `treadwear grade at least ${cls.minTreadwear} (an ungraded tyre fails)`,
    });
  }
  if (cls.maxModificationPoints !== null) {
    lines.push({
      label: "Modification points",
      value: `at most ${formatDecimal(cls.maxModificationPoints, 1)}`,
    });
  }
  if (cls.maxEffectiveDisplacementCc !== null) {
    lines.push({
      label: "Displacement",
      value: `at most ${formatDecimal(cls.maxEffectiveDisplacementCc, 0)} cc after the forced-induction multiplier`,
    });
  }
  return lines;
}

/** When a label stops being valid, in words. */
export function describeExpiryPolicy(policy: ExpiryPolicy): string {
  const years = (n: number) => `${n} ${n === 1 ? "year" : "years"}`;
  switch (policy.kind) {
    case "end-of-label-year":
      return "valid through 31 December of the label year";
    case "years-after-label-year":
      return `valid through 31 December, ${years(policy.years)} after the label year`;
    case "years-from-label-month":
      return `valid through the end of the label month, ${years(policy.years)} later`;
    case "years-from-label-date":
      return `valid through the label date, ${years(policy.years)} later`;
    case "valid-through-date":
      return `accepted through ${policy.date}`;
    case "no-expiry":
      return "no expiry on the label";
  }
}

const CORRECTION_WORDS = {
  "sae-j1349": "corrected to SAE J1349",
  std: "corrected to the older standard day (STD)",
  uncorrected: "as observed (uncorrected)",
} as const;

function generalLines(ruleSet: RuleSet, display: DisplayUnits): LimitLine[] {
  const rule = ruleSet.decisionRule;
  const conditions = ruleSet.measurement.aero;
  const lines: LimitLine[] = [
    {
      label: "Decision rule",
      value:
        rule.kind === "guarded"
          ? `guarded acceptance: clear only when the reading plus its uncertainty (k = ${formatDecimal(rule.k, 2)}) is inside the limit; too close to call means re-measure`
          : "simple acceptance: the reading itself against the limit",
    },
    {
      label: "Aero measured",
      value: [
        conditions.driverAboard ? "driver aboard" : "no driver aboard",
        conditions.levelPad ? "on a level pad" : null,
        conditions.tyrePressureKpa === null
          ? null
          : `tyres at ${formatDecimal(conditions.tyrePressureKpa.min, 0)}–${formatDecimal(conditions.tyrePressureKpa.max, 0)} kPa`,
      ]
        .filter((x) => x !== null)
        .join(", "),
    },
    { label: "Roof peak", value: ruleSet.measurement.references.roofPeak },
    { label: "Rearmost bodywork", value: ruleSet.measurement.references.rearmostBodywork },
    { label: "Body width", value: ruleSet.measurement.references.bodyWidth },
  ];
  const stops = Object.entries(ruleSet.onViolation)
    .filter(([, what]) => what === "stop")
    .map(([id]) => RULE_TITLES[id as keyof typeof RULE_TITLES] ?? id);
  lines.push({
    label: "Over a class's limit",
    value:
      stops.length === 0
        ? "moves the car up the ladder; safety failures hold it"
        : `moves the car up, except ${stops.join(", ")}, which hold it; safety failures hold it`,
  });
  const ptw = ruleSet.powerToWeight;
  if (ptw !== null) {
    lines.push({
      label: "Power-to-weight",
      value: `${ptw.unit}, weight ${ptw.weightBasis === "with-driver" ? "with" : "without"} driver, ${ptw.powerMeasuredAt} power ${CORRECTION_WORDS[ptw.correction]}${ptw.dynoSheetValidYears === null ? "" : `; dyno sheet no older than ${ptw.dynoSheetValidYears} years`}`,
    });
  }
  if (ruleSet.noise !== null) {
    lines.push({
      label: "Noise",
      value: `at most ${formatDecimal(ruleSet.noise.maxDbA, 1)} dB(A), ${ruleSet.noise.method}`,
    });
  }
  lines.push({
    label: "Units shown",
    value: display.length === "mm" ? "millimetres" : "inches",
  });
  return lines;
}

/**
 * A rule set in plain words, class by class, in the event's units: what each class allows, how
 * readings are judged, and when each safety standard's label expires.
 */
export function describeRuleSet(ruleSet: RuleSet, display: DisplayUnits): RuleSetDescription {
  return {
    classes: ruleSet.classes.map((cls) => ({
      id: cls.id,
      name: cls.name,
      description: cls.description ?? null,
      lines: classLines(cls, ruleSet, display),
    })),
    general: generalLines(ruleSet, display),
    standards: ruleSet.safety.standards.map((s) => ({
      name: s.name,
      item: s.item,
      expiry: describeExpiryPolicy(s.policy),
      source: s.source ?? null,
    })),
  };
}
