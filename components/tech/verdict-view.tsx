"use client";
import { VerdictBadge } from "@/components/verdict-badge";
import type { RuleSet } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import type { RuleResult, Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { checklistItemState, type StateTone } from "./checklist-item-state";
import { StateMark } from "./state-mark";

/** A limit's outcome in our words (DESIGN.md): too close to call is what sends a car to re-measure. */
const ruleMark: Record<RuleResult["outcome"], { tone: StateTone; word: string }> = {
  pass: { tone: "cleared", word: "inside" },
  fail: { tone: "stopped", word: "over" },
  inconclusive: { tone: "attention", word: "too close to call" },
  waiting: { tone: "waiting", word: "to measure" },
  "not-applicable": { tone: "neutral", word: "n/a" },
};

/** A verdict with its one-line reason and, on request, every rule and safety item behind it. */
export function VerdictView({
  verdict,
  ruleSet,
  label,
  testId,
}: {
  verdict: Verdict;
  ruleSet: RuleSet;
  label: string;
  testId: string;
}) {
  const className = (id: string | null) => ruleSet.classes.find((c) => c.id === id)?.name ?? id;
  const check =
    verdict.classChecks.find((c) => c.classId === verdict.classId) ?? verdict.classChecks[0];
  return (
    <div className="space-y-2" data-testid={testId} data-status={verdict.status}>
      <p className="text-base font-semibold uppercase tracking-wide text-asphalt-700">{label}</p>
      <VerdictBadge
        status={verdict.status}
        toClass={verdict.status === "moved-up" ? className(verdict.classId) : null}
      />
      <p className="text-lg" data-testid={`${testId}-reason`}>
        {verdict.reason}
      </p>
      {verdict.flags.includes("disagreement") ? (
        <p className="font-semibold text-attention">
          Readings disagree: the chief scrutineer decides.
        </p>
      ) : null}
      <details className="rounded-lg border border-asphalt-300 p-2">
        <summary className="min-h-touch cursor-pointer content-center font-semibold">
          Every rule and item
        </summary>
        {check ? (
          <ul className="mt-2 space-y-1">
            <li className="font-semibold">Class {check.className}</li>
            {check.rules.map((rule) => (
              <li key={`${check.classId}-${rule.ruleId}`} className="text-base">
                <StateMark {...ruleMark[rule.outcome]} /> — {rule.reason}
              </li>
            ))}
          </ul>
        ) : null}
        <ul className="mt-2 space-y-1">
          <li className="font-semibold">Safety</li>
          {verdict.safety.map((item) => (
            <li
              key={item.itemId}
              className="text-base"
              data-testid={`verdict-safety-${item.itemId}`}
              data-tone={checklistItemState(item).tone}
            >
              <StateMark {...checklistItemState(item)} /> — {item.reason}
            </li>
          ))}
          {verdict.eventRules.map((rule) => (
            <li key={rule.ruleId} className="text-base">
              <StateMark {...ruleMark[rule.outcome]} /> — {rule.reason}
            </li>
          ))}
        </ul>
        {verdict.missing.length > 0 ? (
          <p className="mt-2 text-base">
            <strong>Still to do:</strong> {verdict.missing.join(", ")}
          </p>
        ) : null}
      </details>
      <p className="text-base text-asphalt-700">{verdict.notice}</p>
    </div>
  );
}
