import "server-only";
import { and, asc, count, desc, eq, isNull, lt, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { coDriverInvites, entries, passes, payments, users, waivers } from "../../schema";

/**
 * What an entry's checklist reads, straight from the tables each step's part writes: the
 * entry's status and waiting-list place, whether declarations are stored, each signed waiver,
 * the latest payment, the newest co-driver invitation, and whether a live pass exists.
 */
export async function getEntryChecklist({ entryId, now }: { entryId: string; now: Date }) {
  const db = getDb();
  const [entry] = await db
    .select({
      eventId: entries.eventId,
      status: entries.status,
      waitingSeq: entries.waitingSeq,
      driverId: entries.driverId,
      coDriverId: entries.coDriverId,
      declarations: entries.declarations,
      lapTimeEstimateMs: entries.lapTimeEstimateMs,
      coDriverLapTimeEstimateMs: entries.coDriverLapTimeEstimateMs,
      driverExperience: entries.driverExperience,
      coDriverExperience: entries.coDriverExperience,
    })
    .from(entries)
    .where(eq(entries.id, entryId));
  if (!entry) return null;
  const people = [entry.driverId, ...(entry.coDriverId ? [entry.coDriverId] : [])];
  const [ahead, waiverRows, [payment], [invite], [pass], peopleRows] = await Promise.all([
    entry.status === "waiting" && entry.waitingSeq !== null
      ? db
          .select({ n: count() })
          .from(entries)
          .where(
            and(
              eq(entries.eventId, entry.eventId),
              eq(entries.status, "waiting"),
              lt(entries.waitingSeq, entry.waitingSeq),
            ),
          )
      : Promise.resolve([{ n: 0 }]),
    db
      .select({
        signerId: waivers.signerId,
        isMinor: waivers.isMinor,
        guardianSignedAt: waivers.guardianSignedAt,
      })
      .from(waivers)
      .where(and(eq(waivers.eventId, entry.eventId), eq(waivers.entryId, entryId))),
    db
      .select({ status: payments.status })
      .from(payments)
      .where(and(eq(payments.eventId, entry.eventId), eq(payments.entryId, entryId)))
      .orderBy(desc(payments.createdAt))
      .limit(1),
    db
      .select({
        email: coDriverInvites.email,
        expiresAt: coDriverInvites.expiresAt,
        acceptedAt: coDriverInvites.acceptedAt,
        closedAt: coDriverInvites.closedAt,
      })
      .from(coDriverInvites)
      .where(eq(coDriverInvites.entryId, entryId))
      .orderBy(desc(coDriverInvites.createdAt))
      .limit(1),
    db
      .select({ id: passes.id })
      .from(passes)
      .where(
        and(
          eq(passes.eventId, entry.eventId),
          eq(passes.entryId, entryId),
          isNull(passes.revokedAt),
          sql`${passes.expiresAt} > ${now}`,
        ),
      )
      .limit(1),
    db
      .select({ id: users.id, name: users.name, email: users.email })
      .from(users)
      .where(
        sql`${users.id} in (${sql.join(
          people.map((p) => sql`${p}`),
          sql`, `,
        )})`,
      )
      .orderBy(asc(users.email)),
  ]);
  const nameOf = (id: string) => {
    const u = peopleRows.find((p) => p.id === id);
    return u ? (u.name ?? u.email) : "someone";
  };
  return {
    status: entry.status,
    waitingPlace:
      entry.status === "waiting" ? Number((ahead as Array<{ n: number }>)[0]?.n ?? 0) + 1 : null,
    declared:
      typeof entry.declarations === "object" &&
      entry.declarations !== null &&
      Object.keys(entry.declarations).length > 0,
    drivers: people.map((id, i) => {
      const w = waiverRows.find((r) => r.signerId === id);
      return {
        userId: id,
        name: nameOf(id),
        role: i === 0 ? ("driver" as const) : ("co-driver" as const),
        lapTimeEstimateMs: i === 0 ? entry.lapTimeEstimateMs : entry.coDriverLapTimeEstimateMs,
        experience: i === 0 ? entry.driverExperience : entry.coDriverExperience,
        waiver: !w
          ? ("missing" as const)
          : w.isMinor && !w.guardianSignedAt
            ? ("needs-guardian" as const)
            : ("signed" as const),
      };
    }),
    payment: payment?.status ?? null,
    invite: invite ?? null,
    hasPass: Boolean(pass),
  };
}

export type EntryChecklist = NonNullable<Awaited<ReturnType<typeof getEntryChecklist>>>;
