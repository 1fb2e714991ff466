import "server-only";
import { eq } from "drizzle-orm";
import type { Tx } from "../../run-transaction";
import { events } from "../../schema";

/** Lock an event's row for the rest of the transaction (entering, withdrawing and the waiting
 *  list take turns on it); returns its capacity, or null for no such event. */
export async function lockEventRow({ eventId }: { eventId: string }, tx: Tx) {
  const [row] = await tx
    .select({ id: events.id, capacity: events.capacity })
    .from(events)
    .where(eq(events.id, eventId))
    .limit(1)
    .for("update");
  return row ?? null;
}
