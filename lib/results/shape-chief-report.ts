import type { Verdict } from "../scrutineer/verdicts/verdict-schema";
import { formatWhoAndWhen } from "../tech/format-who-and-when";
import type { VerdictWord } from "../verdict-word";
import { latestInstant } from "./latest-instant";
import type { ResultsClass, ResultsEntry } from "./tech-results-input";

/** One reason a car was refused (a rule it failed), in words. */
export type Rejection = {
  /** What failed: "Kestrel class", "Safety: Harness", "Event rule". */
  what: string;
  /** The rule's own line, in the event's units, with its consequence. */
  why: string;
};

/** One car examined at the tech line, as the chief scrutineer reports it to the clerk of course. */
export type ChiefReportCar = {
  entryId: string;
  carNumber: number;
  drivers: string;
  car: string;
  declaredClass: string;
  state: VerdictWord;
  /** The class the car runs in (cleared or moved up); null when it does not run. */
  runsIn: string | null;
  /** The verdict's one line. */
  reason: string;
  /** Every rule the car failed, as computed from the records that count (voided ones are not). */
  rejections: Rejection[];
  /** Measurements too close to call (re-measure or the chief scrutineer decides). */
  open: string[];
  /** The chief scrutineer's decision that stands: who and when, their reason, and what the
   *  records alone had said. */
  decision: { by: string; reason: string; computed: string } | null;
  /** An override that could not be applied, and why. */
  notApplied: { by: string; problem: string } | null;
  /** How many records the car has at the tech line. */
  records: number;
  computedAt: string | null;
};

/** The chief scrutineer's report: every car examined, with its state and each rejection. */
export type ChiefReport = {
  /** The latest verdict's computing time among the cars examined (ISO), null with none. */
  issuedAt: string | null;
  cars: ChiefReportCar[];
  counts: Record<VerdictWord, number> & { examined: number; decidedByChief: number };
};

/** A verdict as stored, with when it was computed. */
export type StoredVerdict = { verdict: Verdict; computedAt: string };

/**
 * The chief scrutineer's report of all cars examined (at least one record at the tech line), by
 * car number, with the reason for each rejection (Motorsport UK NCR 2026 Ch.5 Part A App.6 Arts
 * 2.14–2.16, 3.1: the chief scrutineer reports all cars examined, with reasons for each
 * rejection, to the clerk of the course). Rejections are the failed rules of the stored verdict,
 * which counts no voided record; a standing override is shown with the chief's reason beside what
 * the records said. A car with records but no readable verdict is listed as waiting. Pure.
 * @param recordCounts entry id → number of records (cars with none are not examined)
 * @param officialNames user id → name
 * @param timeZone the event's IANA zone
 */
export function shapeChiefReport(args: {
  entries: readonly ResultsEntry[];
  verdicts: ReadonlyMap<string, StoredVerdict>;
  recordCounts: ReadonlyMap<string, number>;
  classes: readonly ResultsClass[];
  officialNames: ReadonlyMap<string, string>;
  timeZone: string;
}): ChiefReport {
  const className = new Map(args.classes.map((c) => [c.id, c.name]));
  const who = (x: { officialId: string; deviceTime: string }) =>
    formatWhoAndWhen({
      name: args.officialNames.get(x.officialId) ?? null,
      deviceTime: x.deviceTime,
      timeZone: args.timeZone,
    });
  const cars = [...args.entries]
    .filter((e) => (args.recordCounts.get(e.entryId) ?? 0) > 0)
    .sort((a, b) => a.carNumber - b.carNumber)
    .map((e): ChiefReportCar => {
      const stored = args.verdicts.get(e.entryId);
      const v = stored?.verdict;
      const state: VerdictWord = v?.status ?? "waiting";
      const runs = state === "cleared" || state === "moved-up";
      const runsInId = runs ? (v?.classId ?? e.declaredClass) : null;
      return {
        entryId: e.entryId,
        carNumber: e.carNumber,
        drivers: [e.driverName, e.coDriverName].filter(Boolean).join(" & "),
        car: `${e.year} ${e.make} ${e.model} · ${e.colour}`,
        declaredClass: e.declaredClassName,
        state,
        runsIn: runsInId === null ? null : (className.get(runsInId) ?? runsInId),
        reason: v?.reason ?? "Waiting — the verdict is being computed.",
        rejections: v ? rejectionsOf(v) : [],
        open: v ? openPointsOf(v) : [],
        decision: v?.override
          ? {
              by: who(v.override),
              reason: v.override.reason,
              computed: v.override.computedReason,
            }
          : null,
        notApplied: v?.rejectedOverride
          ? { by: who(v.rejectedOverride), problem: v.rejectedOverride.problem }
          : null,
        records: args.recordCounts.get(e.entryId) ?? 0,
        computedAt: stored?.computedAt ?? null,
      };
    });
  const counts = {
    waiting: 0,
    cleared: 0,
    "moved-up": 0,
    "re-measure": 0,
    held: 0,
    examined: cars.length,
    decidedByChief: 0,
  };
  for (const car of cars) {
    counts[car.state] += 1;
    if (car.decision) counts.decidedByChief += 1;
  }
  return {
    issuedAt: latestInstant(cars.flatMap((c) => (c.computedAt ? [c.computedAt] : []))),
    cars,
    counts,
  };
}

/** Each failed rule: class rules by class (lowest first, as the ladder was walked), the event's
 *  own rules, then the safety checklist. */
function rejectionsOf(v: Verdict): Rejection[] {
  return [
    ...v.classChecks.flatMap((check) =>
      check.rules
        .filter((r) => r.outcome === "fail")
        .map((r) => ({ what: `${check.className} class`, why: r.reason })),
    ),
    ...v.eventRules
      .filter((r) => r.outcome === "fail")
      .map((r) => ({ what: "Event rule", why: r.reason })),
    ...v.safety
      .filter((s) => s.outcome === "fail")
      .map((s) => ({ what: `Safety: ${s.label}`, why: s.reason })),
  ];
}

function openPointsOf(v: Verdict): string[] {
  return [...v.classChecks.flatMap((c) => c.rules), ...v.eventRules]
    .filter((r) => r.outcome === "inconclusive")
    .map((r) => r.reason)
    .filter((reason, i, all) => all.indexOf(reason) === i);
}
