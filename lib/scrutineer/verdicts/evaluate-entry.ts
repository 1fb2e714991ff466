import { deriveAeroGeometry } from "../aero/derive-aero-geometry";
import { checkClass } from "../classes/check-class";
import { finishRuleReasons, finishStandaloneReason } from "../classes/finish-rule-reasons";
import { walkClassLadder } from "../classes/walk-class-ladder";
import { implausibleReading } from "../measurement/implausible-reading";
import { readingContext } from "../measurement/reading-context";
import { summariseDimensions } from "../measurement/summarise-dimensions";
import type { ClassCheckContext } from "../power-to-weight/class-check-context";
import { powerToWeightFigure } from "../power-to-weight/power-to-weight-figure";
import type { LengthDimension } from "../records/record-schema";
import { resolveRecords } from "../records/resolve-records";
import { checkNoise } from "../safety/check-noise";
import { checkSafety } from "../safety/check-safety";
import { applyOverride } from "./apply-override";
import type { EvaluateEntryInput } from "./evaluate-entry-input-schema";
import { settleVerdict } from "./settle-verdict";
import { VERDICT_NOTICE } from "./verdict-notice";
import type { Verdict, VerdictFlag } from "./verdict-schema";
import { VERDICT_FLAGS } from "./verdict-schema";

const WING_DIMENSIONS: ReadonlyArray<LengthDimension> = [
  "wingTopFromGroundMm",
  "wingOverhangMm",
  "wingSpanMm",
  "endPlateThicknessMm",
  "wingChordMm",
];
const SPLITTER_DIMENSIONS: ReadonlyArray<LengthDimension> = [
  "splitterProtrusionMm",
  "splitterWidthMm",
];

/**
 * Evaluates one entry at the tech line: applies voids and overrides to ALL the entry's records,
 * combines repeated readings, checks the declared class and moves the car up the ladder as the
 * rule set says, checks safety items on the event date, and explains every result in the event's
 * units. A car with no effective reading, checklist answer, photo or note waits ("not yet seen at
 * the tech line"), whatever its declarations say. Pure and deterministic: the same rule set, entry, set of records and date give the same
 * verdict, whatever the order of the records — on the phone (preview) and on the server (the
 * verdict that counts).
 * @param input validated by `evaluateEntryInputSchema` (the declared class must be in the rule set)
 */
export function evaluateEntry(input: EvaluateEntryInput): Verdict {
  const { ruleSet, entry, eventDate, display } = input;
  const declaredIndex = ruleSet.classes.findIndex((c) => c.id === entry.declaredClassId);
  if (declaredIndex < 0) {
    throw new RangeError(
      `Class "${entry.declaredClassId}" is not in rule set ${ruleSet.id} v${ruleSet.version}`,
    );
  }
  const resolved = resolveRecords(input.records, entry.entryId);
  const flags = new Set<VerdictFlag>(resolved.flags);
  const { dimensions, setAside } = summariseDimensions(resolved.readings, ruleSet);
  if (setAside.length > 0) flags.add("conditions-mismatch");

  // Readings that cannot plausibly be true stay in the verdict as saved, but the chief scrutineer
  // is told which and why.
  const context = readingContext(resolved.readings);
  const implausibleReadings = resolved.readings.flatMap((r) => {
    const why = implausibleReading({
      reading: r.payload,
      ruleSet,
      context,
      unitSystem: display.length,
    });
    if (why === null) return [];
    const corner = "corner" in r.payload ? r.payload.corner : null;
    return [{ recordId: r.id, dimension: r.payload.dimension, corner, why }];
  });
  if (implausibleReadings.length > 0) flags.add("implausible-reading");

  const declarations = entry.declarations;
  const ctx: ClassCheckContext = {
    ruleSet,
    display,
    declarations,
    dimensions,
    geometry: deriveAeroGeometry(dimensions),
    hasWing: declarations.aero.wing || WING_DIMENSIONS.some((d) => dimensions.has(d)),
    hasSplitter: declarations.aero.splitter || SPLITTER_DIMENSIONS.some((d) => dimensions.has(d)),
    powerToWeight: powerToWeightFigure({ ruleSet, dimensions, declarations, display, eventDate }),
  };
  const walk = walkClassLadder(ruleSet.classes, declaredIndex, (cls) => checkClass(cls, ctx));
  const eventRules = checkNoise(ruleSet, dimensions, display);
  const safety = checkSafety(ruleSet, resolved.checklist, eventDate);
  if (safety.unknownItemIds.length > 0) flags.add("unknown-checklist-item");

  const endCheck =
    walk.end.kind === "exhausted" ? undefined : walk.checks[walk.end.classIndex - declaredIndex];
  const missing = [
    ...new Set([
      ...(endCheck?.rules.flatMap((r) => (r.outcome === "waiting" ? r.missing : [])) ?? []),
      ...eventRules.flatMap((r) => (r.outcome === "waiting" ? r.missing : [])),
      ...safety.items.flatMap((s) => (s.outcome === "waiting" ? s.missing : [])),
    ]),
  ];
  const summaries = [...dimensions.values()];
  const settled = settleVerdict({
    walk,
    classes: ruleSet.classes,
    eventRules,
    safety: safety.items,
    dimensions: summaries,
    missing,
    display,
    expiryWarningDays: ruleSet.safety.expiryWarningDays,
  });
  // Declarations alone never clear (or hold) a car: until the tech line has recorded something, it waits.
  const computed =
    resolved.inspectionRecords > 0
      ? settled
      : {
          status: "waiting" as const,
          classId: entry.declaredClassId,
          fallbackClassId: null,
          reason: "Waiting — not yet seen at the tech line.",
        };
  const final = applyOverride({
    computed,
    override: resolved.override,
    ruleSet,
    declaredClassId: entry.declaredClassId,
  });
  if (final.rejectedOverride !== null) flags.add("override-invalid");
  if (final.override !== null) flags.add("overridden");
  if (summaries.some((d) => d.disagreements.length > 0)) flags.add("disagreement");
  const classChecks = finishRuleReasons(walk, ruleSet.classes);
  if (
    [...classChecks.flatMap((c) => c.rules), ...eventRules].some(
      (r) => r.outcome === "inconclusive",
    )
  ) {
    flags.add("inconclusive");
  }
  if (safety.items.some((s) => s.equipment?.status === "expires-soon")) flags.add("expires-soon");

  return {
    entryId: entry.entryId,
    ruleSetId: ruleSet.id,
    ruleSetVersion: ruleSet.version,
    eventDate,
    declaredClassId: entry.declaredClassId,
    status: final.status,
    classId: final.classId,
    fallbackClassId: final.fallbackClassId,
    reason: final.reason,
    flags: VERDICT_FLAGS.filter((f) => flags.has(f)),
    override: final.override,
    rejectedOverride: final.rejectedOverride,
    reinspection: null,
    classChecks,
    eventRules: eventRules.map((r) => ({
      ...r,
      reason: finishStandaloneReason(r.reason, r.outcome),
    })),
    safety: safety.items.map((s) => ({
      ...s,
      reason: finishStandaloneReason(s.reason, s.outcome),
    })),
    dimensions: summaries,
    setAside,
    missing,
    implausibleReadings,
    records: resolved.counts,
    display,
    notice: VERDICT_NOTICE,
  };
}
