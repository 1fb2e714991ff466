import "server-only";
import { eq, max } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import { AppError } from "../../../lib/errors";
import type { RunSheet } from "../../../lib/paddock/run-sheet-schema";
import type { Tx } from "../../run-transaction";
import { events, runGroupPublications } from "../../schema";

/**
 * Store a run sheet as the event's next version, inside the caller's transaction. The event row
 * is locked first, so two publishes at once never get the same number, and the one that finds a
 * newer version than it compared against is refused.
 */
export async function insertRunSheet(
  tx: Tx,
  {
    eventId,
    body,
    publishedBy,
    publishedAt,
    previousVersion,
  }: {
    eventId: string;
    body: RunSheet;
    publishedBy: string;
    publishedAt: Date;
    /** The version the caller compared against (null: none); another since → refused. */
    previousVersion: number | null;
  },
): Promise<{ id: string; version: number }> {
  await tx.select({ id: events.id }).from(events).where(eq(events.id, eventId)).for("update");
  const [last] = await tx
    .select({ version: max(runGroupPublications.version) })
    .from(runGroupPublications)
    .where(eq(runGroupPublications.eventId, eventId));
  if ((last?.version ?? null) !== previousVersion) {
    throw new AppError(
      "conflict",
      `Version ${last?.version} was published a moment ago on another screen. Reload and check it before publishing again.`,
    );
  }
  const version = (last?.version ?? 0) + 1;
  const id = uuidv7();
  await tx
    .insert(runGroupPublications)
    .values({ id, eventId, version, body, publishedBy, publishedAt });
  return { id, version };
}
