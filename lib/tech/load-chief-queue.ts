import "server-only";
import { personName } from "@/lib/auth/person-name";
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
 * A car goes by its stored verdict as read through the verdict schema: a standing override
 * settles it (decided, whatever its readings said), an override that does not fit keeps it
 * waiting with why, and a verdict that does not read counts as none (neither list).
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
  const names = new Map(officials.map((o) => [o.userId, personName(o)]));
  const whoAndWhen = (x: { officialId: string; deviceTime: string }) =>
    formatWhoAndWhen({ name: names.get(x.officialId) ?? null, deviceTime: x.deviceTime, timeZone });
  const byEntry = new Map(verdicts.map((v) => [v.entryId, v]));
  const waiting: ChiefQueueRow[] = [];
  const decided: ChiefQueueRow[] = [];
  for (const e of entries) {
    const v = byEntry.get(e.entryId);
    if (!v) continue; // no verdict yet, or one that does not read: nothing to decide on
    const rejected = v.rejectedOverride;
    const attention = chiefAttention({
      status: v.status,
      flags: v.flags,
      rejectedOverride: rejected && {
        whoAndWhen: whoAndWhen(rejected),
        problem: rejected.problem,
      },
      implausibleReadings: v.implausibleReadings,
    });
    const row: ChiefQueueRow = {
      entryId: e.entryId,
      carNumber: e.carNumber,
      car: `${e.year} ${e.make} ${e.model} · ${e.colour}`,
      drivers: [e.driverName, e.coDriverName].filter(Boolean).join(" & "),
      declaredClass: e.declaredClassName,
      finalClass: v.status === "moved-up" ? e.finalClassName : null,
      status: v.status,
      reason: v.reason,
      attention,
      decidedBy: v.override && whoAndWhen(v.override),
    };
    // One rule for "waits for the chief" (needsChiefScrutineer, via the pack verdict), and the
    // words: a standing override settles the car in both.
    if (v.needsChief || attention.length > 0) waiting.push(row);
    else if (v.override) decided.push(row);
  }
  return { waiting, decided };
}
