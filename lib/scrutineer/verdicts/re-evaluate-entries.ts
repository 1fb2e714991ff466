import { diffRuleSets, type RuleSetChange } from "../rule-sets/diff-rule-sets";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import { RULE_TITLES } from "../rule-sets/rule-titles";
import { formatQuantity } from "../units/format-quantity";
import { evaluateEntry } from "./evaluate-entry";
import type { EvaluateEntryInput } from "./evaluate-entry-input-schema";
import type { RuleResult, Verdict } from "./verdict-schema";

/** One entry to re-evaluate: everything evaluateEntry takes except the rule set. */
export type ReEvaluationEntry = Omit<EvaluateEntryInput, "ruleSet">;

/** A verdict that changes between two rule-set versions, and why. */
export type VerdictChange = {
  entryId: string;
  before: Pick<Verdict, "status" | "classId" | "reason">;
  after: Pick<Verdict, "status" | "classId" | "reason">;
  /** Rule by rule: what moved ("Merlin wing height: limit 100 mm → 80 mm; pass → fail"). */
  why: string[];
};

/** The outcome of re-evaluating every entry under a new rule-set version. */
export type ReEvaluation = {
  fromVersion: number;
  toVersion: number;
  ruleSetChanges: RuleSetChange[];
  changed: VerdictChange[];
  unchangedCount: number;
  /** Entries that cannot be evaluated under one of the versions (e.g. their class was removed). */
  problems: Array<{ entryId: string; message: string }>;
};

function limitText(r: RuleResult, v: Verdict): string {
  return r.limit === null ? "none" : formatQuantity(r.limit.value, r.unit, v.display);
}

/** The rules of the classes in `classIds` and the event's rules, keyed "classId/ruleId". */
function ruleMap(
  v: Verdict,
  classIds: ReadonlySet<string>,
): Map<string, { className: string; rule: RuleResult }> {
  const map = new Map<string, { className: string; rule: RuleResult }>();
  for (const c of v.classChecks) {
    if (!classIds.has(c.classId)) continue;
    for (const rule of c.rules)
      map.set(`${c.classId}/${rule.ruleId}`, { className: c.className, rule });
  }
  for (const rule of v.eventRules) map.set(`event/${rule.ruleId}`, { className: "Event", rule });
  return map;
}

/**
 * Rule by rule, what differs between the two verdicts. Only classes checked under both versions
 * are compared: a class the car reaches under one version only (it moved up, or no longer does)
 * says nothing about the rule set, so its rules are neither "new" nor "no longer checked".
 */
function explainChange(before: Verdict, after: Verdict): string[] {
  const why: string[] = [];
  const checkedAfter = new Set(after.classChecks.map((c) => c.classId));
  const both = new Set(
    before.classChecks.map((c) => c.classId).filter((id) => checkedAfter.has(id)),
  );
  const a = ruleMap(before, both);
  const b = ruleMap(after, both);
  for (const key of [...new Set([...a.keys(), ...b.keys()])].sort()) {
    const x = a.get(key);
    const y = b.get(key);
    const name = `${(y ?? x)?.className ?? ""} ${RULE_TITLES[(y ?? x)?.rule.ruleId ?? "noise"]}`;
    if (x === undefined && y !== undefined) why.push(`${name}: new rule, ${y.rule.outcome}`);
    else if (x !== undefined && y === undefined)
      why.push(`${name}: no longer checked (was ${x.rule.outcome})`);
    else if (x !== undefined && y !== undefined) {
      const parts: string[] = [];
      const la = limitText(x.rule, before);
      const lb = limitText(y.rule, after);
      if (la !== lb) parts.push(`limit ${la} → ${lb}`);
      if (x.rule.outcome !== y.rule.outcome) parts.push(`${x.rule.outcome} → ${y.rule.outcome}`);
      if (parts.length > 0) why.push(`${name}: ${parts.join("; ")}`);
    }
  }
  const sa = new Map(before.safety.map((s) => [s.itemId, s]));
  for (const s of after.safety) {
    const old = sa.get(s.itemId);
    if (old === undefined) why.push(`${s.label}: new checklist item, ${s.outcome}`);
    else if (old.outcome !== s.outcome) why.push(`${s.label}: ${old.outcome} → ${s.outcome}`);
  }
  return why;
}

/**
 * Re-evaluates entries under a new rule-set version and lists every verdict whose status or
 * class changes, with the rule-level reasons, plus what changed in the rule set itself.
 */
export function reEvaluateEntries(args: {
  before: RuleSet;
  after: RuleSet;
  entries: ReadonlyArray<ReEvaluationEntry>;
}): ReEvaluation {
  const changed: VerdictChange[] = [];
  const problems: ReEvaluation["problems"] = [];
  let unchangedCount = 0;
  for (const e of args.entries) {
    let before: Verdict;
    let after: Verdict;
    try {
      before = evaluateEntry({ ...e, ruleSet: args.before });
      after = evaluateEntry({ ...e, ruleSet: args.after });
    } catch (error) {
      problems.push({
        entryId: e.entry.entryId,
        message: error instanceof Error ? error.message : String(error),
      });
      continue;
    }
    if (before.status === after.status && before.classId === after.classId) {
      unchangedCount += 1;
      continue;
    }
    changed.push({
      entryId: e.entry.entryId,
      before: { status: before.status, classId: before.classId, reason: before.reason },
      after: { status: after.status, classId: after.classId, reason: after.reason },
      why: explainChange(before, after),
    });
  }
  return {
    fromVersion: args.before.version,
    toVersion: args.after.version,
    ruleSetChanges: diffRuleSets(args.before, args.after),
    changed,
    unchangedCount,
    problems,
  };
}
