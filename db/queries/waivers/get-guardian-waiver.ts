import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../../client";
import type { Tx } from "../../run-transaction";
import { entries, events, users, waivers } from "../../schema";

/**
 * The minor's acceptance a guardian link names (by the SHA-256 of its token), with the event and
 * its waiver text and the minor's name; or null. With `tx` and `lock`, the waiver row is locked,
 * so one link accepted twice at once is accepted once.
 */
export async function getGuardianWaiver(
  { tokenHash, lock = false }: { tokenHash: string; lock?: boolean },
  tx?: Tx,
) {
  const db = tx ?? getDb();
  if (lock) {
    await db
      .select({ id: waivers.id })
      .from(waivers)
      .where(eq(waivers.guardianTokenHash, tokenHash))
      .for("update");
  }
  const [row] = await db
    .select({
      waiverId: waivers.id,
      entryId: waivers.entryId,
      eventId: waivers.eventId,
      signerId: waivers.signerId,
      minorName: users.name,
      signedName: waivers.signedName,
      textVersion: waivers.textVersion,
      guardianName: waivers.guardianName,
      guardianRequestedAt: waivers.guardianRequestedAt,
      guardianSignedAt: waivers.guardianSignedAt,
      carNumber: entries.carNumber,
      entryStatus: entries.status,
      eventName: events.name,
      eventDate: events.eventDate,
      eventStatus: events.status,
      waiverText: events.waiverText,
      waiverVersion: events.waiverVersion,
    })
    .from(waivers)
    .innerJoin(entries, eq(entries.id, waivers.entryId))
    .innerJoin(events, eq(events.id, waivers.eventId))
    .innerJoin(users, eq(users.id, waivers.signerId))
    .where(eq(waivers.guardianTokenHash, tokenHash))
    .limit(1);
  return row ?? null;
}

export type GuardianWaiver = NonNullable<Awaited<ReturnType<typeof getGuardianWaiver>>>;
