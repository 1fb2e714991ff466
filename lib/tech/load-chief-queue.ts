import "server-only";
import { listEventEntries } from "../../db/queries/list-event-entries";
import { listEventOfficials } from "../../db/queries/list-event-officials";
import { listEventVerdicts } from "../../db/queries/list-event-verdicts";
import type { VerdictWord } from "../verdict-word";
import { chiefAttention } from "./chief-attention";
import { formatWhoAndWhen } from "./format-who-and-when";

/** One car on the chief scrutineer's page. */
export type ChiefQueueRow = {
  entryId: string;
  carNumber: number;
  car: string;
  drivers: string;
  declaredClass: string;
  finalClass: string | null;
  status: VerdictWord;
  reason: string | null;
  /** Why the car waits for the chief, in words (empty for a car already decided). */
  attention: string[];
  /** "Helen Marsh at 10:42 on Sat 16 May" when the chief's decision stands. */
  decidedBy: string | null;
};

/**
 * The chief scrutineer's page: cars that need a decision (readings that disagree, too close to
 * call, an override not applied, held, re-measure) with why in words, and the cars already
 * decided by override with who decided and when (the deciding phone's clock, event time zone).
 */
export async function loadChiefQueue({
  eventId,
  timeZone,
}: {
  eventId: string;
  timeZone: string;
}): Promise<{ waiting: ChiefQueueRow[]; decided: ChiefQueueRow[] }> {
  const [entries, verdicts, officials] = await Promise.all([
    listEventEntries({ eventId }),
    listEventVerdicts({ eventId }),
    listEventOfficials({ eventId }),
  ]);
  const names = new Map(officials.map((o) => [o.userId, o.name ?? o.email]));
  const whoAndWhen = (x: { officialId: string; deviceTime: string }) =>
    formatWhoAndWhen({ name: names.get(x.officialId) ?? null, deviceTime: x.deviceTime, timeZone });
  const byEntry = new Map(verdicts.map((v) => [v.entryId, v]));
  const waiting: ChiefQueueRow[] = [];
  const decided: ChiefQueueRow[] = [];
  for (const e of entries) {
    const v = byEntry.get(e.entryId);
    const rejected = v?.rejectedOverride ?? null;
    const attention = v
      ? chiefAttention({
          status: v.status,
          flags: v.flags,
          rejectedOverride: rejected && {
            whoAndWhen: whoAndWhen(rejected),
            problem: rejected.problem,
          },
        })
      : [];
    const override = v?.override ?? null;
    const row: ChiefQueueRow = {
      entryId: e.entryId,
      carNumber: e.carNumber,
      car: `${e.year} ${e.make} ${e.model} · ${e.colour}`,
      drivers: [e.driverName, e.coDriverName].filter(Boolean).join(" & "),
      declaredClass: e.declaredClassName,
      finalClass: e.status === "moved-up" ? e.finalClassName : null,
      status: e.status,
      reason: e.reason,
      attention,
      decidedBy: override && whoAndWhen(override),
    };
    if (e.needsChief || attention.length > 0) waiting.push(row);
    else if (override) decided.push(row);
  }
  return { waiting, decided };
}
