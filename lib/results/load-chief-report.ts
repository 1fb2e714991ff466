import "server-only";
import { personName } from "@/lib/auth/person-name";
import { countEventRecordsByEntry } from "../../db/queries/count-event-records-by-entry";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { listEventEntries } from "../../db/queries/list-event-entries";
import { listEventOfficials } from "../../db/queries/list-event-officials";
import { listEventVerdictResults } from "../../db/queries/list-event-verdict-results";
import { parseStoredVerdict } from "../entries/parse-stored-verdict";
import { AppError } from "../errors";
import { type ChiefReport, type StoredVerdict, shapeChiefReport } from "./shape-chief-report";

/** The chief scrutineer's report as of now (see {@link shapeChiefReport}), with zone and units.
 *  Stored verdicts are read through the verdict schema; one that does not read counts as none. */
export async function loadChiefReport({ eventId }: { eventId: string }): Promise<{
  report: ChiefReport;
  timeZone: string;
  unitSystem: "mm" | "in";
}> {
  const [rules, entries, rows, recordCounts, officials] = await Promise.all([
    getEventRuleSet({ eventId }),
    listEventEntries({ eventId }),
    listEventVerdictResults({ eventId }),
    countEventRecordsByEntry({ eventId }),
    listEventOfficials({ eventId }),
  ]);
  if (!rules) throw new AppError("not_found", "No such event.");
  const verdicts = new Map<string, StoredVerdict>();
  for (const row of rows) {
    const verdict = parseStoredVerdict({ entryId: row.entryId, result: row.result });
    if (verdict) verdicts.set(row.entryId, { verdict, computedAt: row.computedAt.toISOString() });
  }
  const report = shapeChiefReport({
    entries,
    verdicts,
    recordCounts,
    classes: rules.ruleSet.classes,
    officialNames: new Map(officials.map((o) => [o.userId, personName(o)])),
    timeZone: rules.timeZone,
  });
  return { report, timeZone: rules.timeZone, unitSystem: rules.unitSystem };
}
