import type { Corner, Dimension, TechRecordOf } from "../records/record-schema";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import type { DimensionSummary, Verdict } from "../verdicts/verdict-schema";
import { combineReadings } from "./combine-readings";
import { findDisagreements } from "./find-disagreements";

/** Combined readings keyed by dimension ("cornerWeightKg:lf" for a corner). */
export type DimensionMap = Map<string, DimensionSummary>;

/** The key of a dimension in a {@link DimensionMap}. */
export function dimensionKey(dimension: Dimension, corner: Corner | null = null): string {
  return corner === null ? dimension : `${dimension}:${corner}`;
}

type Conditions = RuleSet["measurement"]["aero"];

/** Why a reading was not taken under the rule set's conditions, or null when it was. */
function conditionsMismatch(
  noted: TechRecordOf<"reading">["payload"]["conditions"],
  rule: Conditions,
): string | null {
  if (noted === undefined) return null;
  if (noted.driverAboard !== undefined && noted.driverAboard !== rule.driverAboard) {
    return rule.driverAboard ? "taken without the driver aboard" : "taken with the driver aboard";
  }
  if (rule.levelPad && noted.levelPad === false) return "not taken on the level pad";
  const p = rule.tyrePressureKpa;
  if (p && noted.tyrePressureKpa !== undefined) {
    if (noted.tyrePressureKpa < p.min || noted.tyrePressureKpa > p.max) {
      return `tyre pressure ${noted.tyrePressureKpa} kPa outside ${p.min}–${p.max} kPa`;
    }
  }
  return null;
}

/**
 * Groups an entry's effective readings by dimension (and corner), drops readings taken outside
 * the rule set's measurement conditions, combines the rest (mean, Type A, Type B, U = k·u) and
 * flags officials whose values disagree.
 * @returns the summaries, and the readings set aside for their conditions
 */
export function summariseDimensions(
  readings: ReadonlyArray<TechRecordOf<"reading">>,
  ruleSet: RuleSet,
): { dimensions: DimensionMap; setAside: Verdict["setAside"] } {
  const k = ruleSet.decisionRule.k;
  const groups = new Map<
    string,
    { dimension: Dimension; corner: Corner | null; used: TechRecordOf<"reading">[] }
  >();
  const setAside: Verdict["setAside"] = [];
  for (const r of readings) {
    const p = r.payload;
    const corner = p.dimension === "cornerWeightKg" ? p.corner : null;
    const key = dimensionKey(p.dimension, corner);
    let group = groups.get(key);
    if (group === undefined) {
      group = { dimension: p.dimension, corner, used: [] };
      groups.set(key, group);
    }
    const rule =
      p.dimension === "cornerWeightKg"
        ? ruleSet.measurement.weighing
        : p.dimension === "noiseDbA"
          ? null
          : ruleSet.measurement.aero;
    const why = rule === null ? null : conditionsMismatch(p.conditions, rule);
    if (why === null) group.used.push(r);
    else setAside.push({ recordId: r.id, dimension: p.dimension, corner, why });
  }
  const dimensions: DimensionMap = new Map();
  const keys = [...groups.keys()].sort();
  for (const key of keys) {
    const g = groups.get(key);
    if (g === undefined || g.used.length === 0) continue;
    const values = g.used.map((r) => ({
      recordId: r.id,
      value: r.payload.value,
      standardUncertainty: r.payload.instrument.standardUncertainty,
      instrumentId: r.payload.instrument.id,
      officialId: r.officialId,
    }));
    const combined = combineReadings(values, k);
    if (combined === null) continue;
    dimensions.set(key, {
      dimension: g.dimension,
      corner: g.corner,
      ...combined,
      readingIds: g.used.map((r) => r.id),
      disagreements: findDisagreements(values, k),
    });
  }
  return { dimensions, setAside };
}
