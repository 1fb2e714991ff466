import "server-only";
import { and, asc, count, eq, isNotNull } from "drizzle-orm";
import { SEND_MAIL } from "../../../lib/jobs/job-kinds";
import { composeWaitingListMovedMail } from "../../../lib/mail/compose-waiting-list-moved-mail";
import type { Tx } from "../../run-transaction";
import { entries, events, users } from "../../schema";
import { enqueueJobs } from "../jobs/enqueue-jobs";

/**
 * Fill the field from the waiting list, under the event's row lock the caller holds: while fewer
 * entries are `entered` than the event's capacity, the waiting entry with the lowest `waitingSeq`
 * becomes `entered` and its driver gets the waiting-list-moved e-mail (queued in this
 * transaction). Returns the entries moved up, in order.
 */
export async function promoteWaitingEntries(
  { eventId, capacity, appUrl }: { eventId: string; capacity: number; appUrl: string },
  tx: Tx,
): Promise<Array<{ entryId: string; carNumber: number }>> {
  const [entered] = await tx
    .select({ n: count() })
    .from(entries)
    .where(and(eq(entries.eventId, eventId), eq(entries.status, "entered")));
  const free = capacity - Number(entered?.n ?? 0);
  if (free <= 0) return [];
  const moving = await tx
    .select({
      entryId: entries.id,
      carNumber: entries.carNumber,
      driverEmail: users.email,
      eventName: events.name,
      eventDate: events.eventDate,
    })
    .from(entries)
    .innerJoin(users, eq(users.id, entries.driverId))
    .innerJoin(events, eq(events.id, entries.eventId))
    .where(
      and(
        eq(entries.eventId, eventId),
        eq(entries.status, "waiting"),
        isNotNull(entries.waitingSeq),
      ),
    )
    .orderBy(asc(entries.waitingSeq))
    .limit(free)
    .for("update");
  for (const m of moving) {
    await tx
      .update(entries)
      .set({ status: "entered", waitingSeq: null })
      .where(eq(entries.id, m.entryId));
  }
  await enqueueJobs(
    moving.map((m) => ({
      kind: SEND_MAIL,
      payload: {
        to: m.driverEmail,
        ...composeWaitingListMovedMail({
          eventName: m.eventName,
          eventDate: m.eventDate,
          carNumber: m.carNumber,
          entryUrl: new URL(`/entries/${m.entryId}`, appUrl).toString(),
        }),
        kind: "waiting-list-moved",
        eventId,
      },
      dedupeKey: `waiting-list-moved:${m.entryId}`,
    })),
    tx,
  );
  return moving.map(({ entryId, carNumber }) => ({ entryId, carNumber }));
}
