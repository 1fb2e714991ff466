import "server-only";
import { personName } from "@/lib/auth/person-name";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { listEventEntries } from "../../db/queries/list-event-entries";
import { listEventOfficials } from "../../db/queries/list-event-officials";
import { listEventVerdicts } from "../../db/queries/list-event-verdicts";
import { AppError } from "../errors";
import { shapeTechResults, type TechResults } from "./shape-tech-results";

/** The event's tech results as of now (see {@link shapeTechResults}), with its zone and units. */
export async function loadTechResults({ eventId }: { eventId: string }): Promise<{
  results: TechResults;
  timeZone: string;
  unitSystem: "mm" | "in";
}> {
  const [rules, entries, verdicts, officials] = await Promise.all([
    getEventRuleSet({ eventId }),
    listEventEntries({ eventId }),
    listEventVerdicts({ eventId }),
    listEventOfficials({ eventId }),
  ]);
  if (!rules) throw new AppError("not_found", "No such event.");
  const results = shapeTechResults({
    entries,
    verdicts,
    classes: rules.ruleSet.classes,
    officialNames: new Map(officials.map((o) => [o.userId, personName(o)])),
    timeZone: rules.timeZone,
  });
  return { results, timeZone: rules.timeZone, unitSystem: rules.unitSystem };
}
