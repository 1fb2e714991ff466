import { verdictLabels } from "../verdict-word";
import { describeIssueTime } from "./describe-issue-time";
import { formatLocalDateTime } from "./format-local-date-time";
import { resultsCsv } from "./results-csv";
import type { TechResults } from "./shape-tech-results";

/**
 * The tech results as CSV, one line per car by car number: its class (declared and run in), its
 * state and why (in the event's units), whether the chief scrutineer decided it, and its verdict
 * time in the event's zone. Every line says the results are provisional, with their time of issue,
 * so a line copied elsewhere keeps both.
 * @param timeZone the event's IANA zone (named in the time column's heading)
 */
export function techResultsCsv(
  results: TechResults,
  timeZone: string,
  standingWords?: string,
): string {
  const cars = results.classes
    .flatMap((c) => c.cars)
    .concat(results.held, results.notYet)
    .sort((a, b) => a.carNumber - b.carNumber);
  const standing =
    standingWords ?? `Provisional, issued ${describeIssueTime(results.issuedAt, timeZone)}`;
  return resultsCsv(
    [
      "Car",
      "Driver(s)",
      "Car make and model",
      "Declared class",
      "Runs in class",
      "State",
      "Why",
      "Decided by the chief scrutineer",
      `Verdict computed (${timeZone})`,
      "Results",
    ],
    cars.map((c) => [
      c.carNumber,
      c.drivers,
      c.car,
      c.declaredClass,
      c.runsIn ?? "",
      verdictLabels[c.state],
      c.reason,
      c.decidedBy ?? "",
      c.computedAt ? formatLocalDateTime(c.computedAt, timeZone) : "",
      standing,
    ]),
  );
}
