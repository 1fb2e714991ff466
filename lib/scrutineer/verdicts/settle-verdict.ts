import type { ClassRules } from "../classes/class-rules-schema";
import type { LadderWalk } from "../classes/walk-class-ladder";
import { dimensionLabel } from "../measurement/dimension-labels";
import { RULE_TITLES } from "../rule-sets/rule-titles";
import type { DisplayUnits } from "../units/display-units";
import { formatDecimal } from "../units/format-decimal";
import { DISPLAY_DECIMALS, formatLength } from "../units/format-length";
import { formatMass } from "../units/format-mass";
import { midSentence } from "../units/mid-sentence";
import type {
  DimensionSummary,
  RuleResult,
  SafetyItemResult,
  VerdictStatus,
} from "./verdict-schema";

/** The computed outcome before any override. */
export type SettledVerdict = {
  status: VerdictStatus;
  classId: string | null;
  fallbackClassId: string | null;
  reason: string;
};

function andMore(count: number): string {
  return count > 0 ? ` (and ${count} more)` : "";
}

function formatDimensionValue(
  d: DimensionSummary,
  value: number,
  display: DisplayUnits,
  extraDecimals: number,
): string {
  if (d.dimension === "cornerWeightKg") return formatMass(value, display.mass, 1 + extraDecimals);
  if (d.dimension === "noiseDbA") return `${formatDecimal(value, 1 + extraDecimals)} dB(A)`;
  return formatLength(value, display.length, DISPLAY_DECIMALS[display.length] + extraDecimals);
}

/**
 * Two officials' values and the allowed difference, worded at the first resolution (at most 3
 * decimals more than the display's) where the values differ and their difference visibly
 * exceeds the allowance.
 */
function formatDisagreement(
  d: DimensionSummary,
  pair: DimensionSummary["disagreements"][number],
  display: DisplayUnits,
): [string, string, string] {
  let words: [string, string, string] = ["", "", ""];
  for (let extra = 0; extra <= 3; extra += 1) {
    const at = (value: number) => formatDimensionValue(d, value, display, extra);
    words = [at(pair.first.mean), at(pair.second.mean), at(pair.allowedDifference)];
    if (words[0] !== words[1] && at(pair.difference) !== words[2]) break;
  }
  return words;
}

/**
 * Decides the verdict from everything checked, most serious first — held (a safety failure,
 * the noise limit, a stop-kind failure, or over every class), then re-measure (a doubt under
 * guarded acceptance, or two officials' readings that disagree), then waiting, then cleared or moved up — and
 * words the one-line reason.
 */
export function settleVerdict(args: {
  walk: LadderWalk;
  classes: ReadonlyArray<ClassRules>;
  eventRules: ReadonlyArray<RuleResult>;
  safety: ReadonlyArray<SafetyItemResult>;
  dimensions: ReadonlyArray<DimensionSummary>;
  missing: ReadonlyArray<string>;
  display: DisplayUnits;
  expiryWarningDays: number;
}): SettledVerdict {
  const { walk, classes, eventRules, safety, display } = args;
  const declared = walk.checks[0];
  const nameAt = (index: number) => classes[index]?.name ?? "?";
  const idAt = (index: number) => classes[index]?.id ?? null;
  const endIndex = walk.end.kind === "exhausted" ? null : walk.end.classIndex;
  const endCheck = endIndex === null ? undefined : walk.checks[endIndex - walk.declaredIndex];

  const held: string[] = [
    ...safety.filter((s) => s.outcome === "fail").map((s) => s.reason),
    ...eventRules.filter((r) => r.outcome === "fail").map((r) => r.reason),
  ];
  if (walk.end.kind === "stopped") {
    held.push(
      ...(endCheck?.rules
        .filter((r) => r.outcome === "fail" && r.onFail === "stop")
        .map((r) => r.reason) ?? []),
    );
  }
  if (held.length > 0) {
    return {
      status: "held",
      classId: null,
      fallbackClassId: null,
      reason: `Held — fix and re-present: ${midSentence(held[0] ?? "")}${andMore(held.length - 1)}.`,
    };
  }
  if (walk.end.kind === "exhausted") {
    const top = walk.checks[walk.checks.length - 1];
    const fails = top?.rules.filter((r) => r.outcome === "fail") ?? [];
    return {
      status: "held",
      classId: null,
      fallbackClassId: null,
      reason: `Held — over every class's limits; in ${top?.className ?? "the top class"}: ${midSentence(fails[0]?.reason ?? "over")}${andMore(fails.length - 1)}.`,
    };
  }

  const disagreeing = args.dimensions.filter((d) => d.disagreements.length > 0);
  const doubts = [
    ...eventRules.filter((r) => r.outcome === "inconclusive"),
    ...(walk.end.kind === "unsure"
      ? (endCheck?.rules.filter((r) => r.outcome === "inconclusive") ?? [])
      : []),
  ];
  const firstDisagreeing = disagreeing[0];
  const firstPair = firstDisagreeing?.disagreements[0];
  if (firstDisagreeing !== undefined && firstPair !== undefined) {
    const count = disagreeing.reduce((n, d) => n + d.disagreements.length, 0);
    const label = dimensionLabel(firstDisagreeing.dimension, firstDisagreeing.corner);
    const [first, second, allowed] = formatDisagreement(firstDisagreeing, firstPair, display);
    const asRead =
      walk.end.kind === "fits" && walk.end.classIndex > walk.declaredIndex
        ? `; as read, the car moves up to ${nameAt(walk.end.classIndex)}`
        : "";
    return {
      status: "re-measure",
      classId: idAt(walk.end.classIndex),
      fallbackClassId: walk.fallbackClassIndex === null ? null : idAt(walk.fallbackClassIndex),
      reason: `Re-measure — two scrutineers' readings of the ${label} differ: ${first} and ${second}, more than the ${allowed} their uncertainties allow${andMore(count - 1)}${asRead}; re-measure to find which is right, then the chief scrutineer voids the wrong one.`,
    };
  }
  const firstDoubt = doubts[0];
  if (firstDoubt !== undefined) {
    const atTop = walk.end.classIndex >= classes.length - 1;
    const ifOver =
      firstDoubt.classId === null
        ? "if over, held"
        : walk.fallbackClassIndex !== null
          ? `if over, moves up to ${nameAt(walk.fallbackClassIndex)}`
          : atTop
            ? "if over, held"
            : "if over, moves up";
    return {
      status: "re-measure",
      classId: idAt(walk.end.classIndex),
      fallbackClassId: walk.fallbackClassIndex === null ? null : idAt(walk.fallbackClassIndex),
      reason: `Re-measure — ${midSentence(firstDoubt.reason)}${andMore(doubts.length - 1)}; ${ifOver}; or ask the chief scrutineer.`,
    };
  }

  const waiting =
    walk.end.kind === "incomplete" ||
    eventRules.some((r) => r.outcome === "waiting") ||
    safety.some((s) => s.outcome === "waiting");
  if (waiting) {
    const shown = args.missing.slice(0, 5).map(midSentence).join(", ");
    const from = declared?.className ?? "the declared class";
    const moved =
      walk.end.classIndex <= walk.declaredIndex
        ? ""
        : walk.end.kind === "fits"
          ? `would move up from ${from} to ${nameAt(walk.end.classIndex)}; `
          : `over ${from}'s limits, ${nameAt(walk.end.classIndex)} still to settle; `;
    return {
      status: "waiting",
      classId: idAt(walk.end.classIndex),
      fallbackClassId: null,
      reason: `Waiting — ${moved}still to do: ${shown === "" ? "the remaining checks" : shown}${andMore(args.missing.length - 5)}.`,
    };
  }

  const expiring = safety
    .filter((s) => s.equipment?.status === "expires-soon")
    .map((s) => midSentence(s.label));
  const expiryNote =
    expiring.length === 0
      ? ""
      : `; ${expiring.join(", ")} ${expiring.length === 1 ? "expires" : "expire"} within ${args.expiryWarningDays} days`;
  if (walk.end.classIndex > walk.declaredIndex) {
    const fails = declared?.rules.filter((r) => r.outcome === "fail") ?? [];
    return {
      status: "moved-up",
      classId: idAt(walk.end.classIndex),
      fallbackClassId: null,
      reason: `Moves up from ${declared?.className ?? "?"} to ${nameAt(walk.end.classIndex)} — ${midSentence(fails[0]?.reason ?? "over the class's limits")}${andMore(fails.length - 1)}${expiryNote}.`,
    };
  }
  const measured = (endCheck?.rules ?? []).filter(
    (r) =>
      r.conformanceProbability !== null &&
      r.reading !== null &&
      r.marginText !== null &&
      r.decisionRule !== "declared",
  );
  const closest = [...measured].sort(
    (a, b) =>
      (a.conformanceProbability ?? 1) - (b.conformanceProbability ?? 1) ||
      (a.marginToLimit ?? 0) - (b.marginToLimit ?? 0),
  )[0];
  const closestNote =
    closest === undefined ? "" : `; closest: ${RULE_TITLES[closest.ruleId]}, ${closest.marginText}`;
  return {
    status: "cleared",
    classId: idAt(walk.end.classIndex),
    fallbackClassId: null,
    reason: `Cleared in ${nameAt(walk.end.classIndex)} — all checks passed${closestNote}${expiryNote}.`,
  };
}
