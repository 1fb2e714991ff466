import type { VerdictWord } from "../verdict-word";

/** An entry as the results read it (from `listEventEntries`): car, drivers, declared class. */
export type ResultsEntry = {
  entryId: string;
  carNumber: number;
  declaredClass: string;
  declaredClassName: string;
  make: string;
  model: string;
  year: number;
  colour: string;
  driverName: string | null;
  coDriverName: string | null;
};

/** A stored verdict in its short form (from `listEventVerdicts`); an entry without one waits. */
export type ResultsVerdict = {
  entryId: string;
  status: VerdictWord;
  classId: string | null;
  reason: string;
  override: { officialId: string; deviceTime: string } | null;
  computedAt: string;
};

/** A class of the event's rule set, in ladder order (lowest first). */
export type ResultsClass = { id: string; name: string };
