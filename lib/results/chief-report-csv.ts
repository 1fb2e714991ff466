import { verdictLabels } from "../verdict-word";
import { describeIssueTime } from "./describe-issue-time";
import { formatLocalDateTime } from "./format-local-date-time";
import { resultsCsv } from "./results-csv";
import type { ChiefReport } from "./shape-chief-report";

/**
 * The chief scrutineer's report as CSV, one line per car examined: state, class, the verdict's
 * line, each rejection on its own line within one cell ("Kestrel class: …"), the chief's decision
 * with its reason, and the verdict time in the event's zone. Every line says the report is
 * provisional, with its time of issue.
 */
export function chiefReportCsv(
  report: ChiefReport,
  timeZone: string,
  standingWords?: string,
): string {
  const standing =
    standingWords ?? `Provisional, issued ${describeIssueTime(report.issuedAt, timeZone)}`;
  return resultsCsv(
    [
      "Car",
      "Driver(s)",
      "Car make and model",
      "Declared class",
      "State",
      "Runs in class",
      "Verdict",
      "Reasons for rejection",
      "Too close to call",
      "Chief scrutineer's decision",
      "Records",
      `Verdict computed (${timeZone})`,
      "Report",
    ],
    report.cars.map((c) => [
      c.carNumber,
      c.drivers,
      c.car,
      c.declaredClass,
      verdictLabels[c.state],
      c.runsIn ?? "",
      c.reason,
      c.rejections.map((r) => `${r.what}: ${r.why}`).join("\n"),
      c.open.join("\n"),
      [
        c.decision
          ? `${c.decision.by}: ${c.decision.reason} (the records said: ${c.decision.computed})`
          : "",
        c.notApplied ? `Not applied (${c.notApplied.by}): ${c.notApplied.problem}` : "",
      ]
        .filter(Boolean)
        .join("\n"),
      c.records,
      c.computedAt ? formatLocalDateTime(c.computedAt, timeZone) : "",
      standing,
    ]),
  );
}
