import { formatWhoAndWhen } from "../tech/format-who-and-when";
import type { VerdictWord } from "../verdict-word";
import { latestInstant } from "./latest-instant";
import type { ResultsClass, ResultsEntry, ResultsVerdict } from "./tech-results-input";

/** One car in the tech results. */
export type TechResultCar = {
  entryId: string;
  carNumber: number;
  drivers: string;
  car: string;
  declaredClass: string;
  /** The class the car runs in (cleared or moved up); null when it does not run yet. */
  runsIn: string | null;
  state: VerdictWord;
  /** The verdict's one line, in the event's units ("… over by 2 mm — moves up to Merlin."). */
  reason: string;
  /** "Helen Marsh at 10:42 on Sat 16 May" when the chief scrutineer's override stands. */
  decidedBy: string | null;
  /** When the verdict was computed (ISO instant), null when there is none yet. */
  computedAt: string | null;
};

/** The tech results of an event: who runs in which class, who moved up and why, who does not run. */
export type TechResults = {
  /** The time of issue: the latest verdict's computing time (ISO), null with no verdict yet. */
  issuedAt: string | null;
  /** Every class of the ladder, lowest first, with the cars running in it (by car number). */
  classes: { classId: string; className: string; cars: TechResultCar[] }[];
  /** Cars that moved up, with why (also listed in the class they run in). */
  movedUp: TechResultCar[];
  /** Held cars, with why: they do not run until fixed and re-presented. */
  held: TechResultCar[];
  /** Cars not yet decided (waiting or re-measure), with why. */
  notYet: TechResultCar[];
  counts: Record<VerdictWord, number> & { total: number };
};

const NO_VERDICT = "Waiting — no verdict yet.";

/**
 * Tech results from the event's entries and stored verdicts: each class of the ladder with the
 * cars cleared in it or moved up into it, the moved-up cars with why, and the held and undecided
 * cars with why. An entry without a readable verdict waits (as everywhere in Plumbline). Pure.
 * @param officialNames user id → name, for who made a standing override
 * @param timeZone the event's IANA zone (who decided and when)
 */
export function shapeTechResults(args: {
  entries: readonly ResultsEntry[];
  verdicts: readonly ResultsVerdict[];
  classes: readonly ResultsClass[];
  officialNames: ReadonlyMap<string, string>;
  timeZone: string;
}): TechResults {
  const byEntry = new Map(args.verdicts.map((v) => [v.entryId, v]));
  const className = new Map(args.classes.map((c) => [c.id, c.name]));
  const cars = [...args.entries]
    .sort((a, b) => a.carNumber - b.carNumber)
    .map((e): TechResultCar & { runsInId: string | null } => {
      const v = byEntry.get(e.entryId);
      const state: VerdictWord = v?.status ?? "waiting";
      const runs = state === "cleared" || state === "moved-up";
      const runsInId = runs ? (v?.classId ?? e.declaredClass) : null;
      return {
        entryId: e.entryId,
        carNumber: e.carNumber,
        drivers: [e.driverName, e.coDriverName].filter(Boolean).join(" & "),
        car: `${e.year} ${e.make} ${e.model} · ${e.colour}`,
        declaredClass: e.declaredClassName,
        runsInId,
        runsIn: runsInId === null ? null : (className.get(runsInId) ?? runsInId),
        state,
        reason: v?.reason ?? NO_VERDICT,
        decidedBy: v?.override
          ? formatWhoAndWhen({
              name: args.officialNames.get(v.override.officialId) ?? null,
              deviceTime: v.override.deviceTime,
              timeZone: args.timeZone,
            })
          : null,
        computedAt: v?.computedAt ?? null,
      };
    });
  const strip = ({ runsInId: _, ...car }: TechResultCar & { runsInId: string | null }) => car;
  const ladderIds = new Set(args.classes.map((c) => c.id));
  // A class id no longer on the ladder (should not happen) still gets its own block, last.
  const strays = [
    ...new Set(cars.flatMap((c) => (c.runsInId && !ladderIds.has(c.runsInId) ? [c.runsInId] : []))),
  ];
  const classes = [...args.classes, ...strays.map((id) => ({ id, name: id }))].map((c) => ({
    classId: c.id,
    className: c.name,
    cars: cars.filter((car) => car.runsInId === c.id).map(strip),
  }));
  const counts = { waiting: 0, cleared: 0, "moved-up": 0, "re-measure": 0, held: 0, total: 0 };
  for (const car of cars) {
    counts[car.state] += 1;
    counts.total += 1;
  }
  const listed = new Set(args.entries.map((e) => e.entryId));
  return {
    issuedAt: latestInstant(
      args.verdicts.filter((v) => listed.has(v.entryId)).map((v) => v.computedAt),
    ),
    classes,
    movedUp: cars.filter((c) => c.state === "moved-up").map(strip),
    held: cars.filter((c) => c.state === "held").map(strip),
    notYet: cars.filter((c) => c.state === "waiting" || c.state === "re-measure").map(strip),
    counts,
  };
}
