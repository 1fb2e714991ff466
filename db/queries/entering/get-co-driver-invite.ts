import "server-only";
import { eq } from "drizzle-orm";
import { hashInviteToken } from "../../../lib/entries/co-driver-invite-token";
import { classNamesFromRuleSet } from "../../../lib/passes/class-names-from-rule-set";
import { getDb } from "../../client";
import { cars, coDriverInvites, entries, events, ruleSetVersions, users } from "../../schema";

/** The invitation a link's token names (found by the token's hash), with its entry; or null. */
export async function getCoDriverInvite({ token }: { token: string }) {
  const [row] = await getDb()
    .select({
      id: coDriverInvites.id,
      email: coDriverInvites.email,
      expiresAt: coDriverInvites.expiresAt,
      acceptedAt: coDriverInvites.acceptedAt,
      acceptedBy: coDriverInvites.acceptedBy,
      closedAt: coDriverInvites.closedAt,
      entryId: entries.id,
      entryStatus: entries.status,
      driverId: entries.driverId,
      coDriverId: entries.coDriverId,
      carNumber: entries.carNumber,
      declaredClass: entries.declaredClass,
      car: { make: cars.make, model: cars.model, year: cars.year },
      eventName: events.name,
      eventDate: events.eventDate,
      ruleSetBody: ruleSetVersions.body,
      driverName: users.name,
      driverEmail: users.email,
    })
    .from(coDriverInvites)
    .innerJoin(entries, eq(entries.id, coDriverInvites.entryId))
    .innerJoin(cars, eq(cars.id, entries.carId))
    .innerJoin(events, eq(events.id, entries.eventId))
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .innerJoin(users, eq(users.id, entries.driverId))
    .where(eq(coDriverInvites.tokenHash, hashInviteToken(token)))
    .limit(1);
  if (!row) return null;
  const { ruleSetBody, car, ...rest } = row;
  return {
    ...rest,
    carWords: `${car.year} ${car.make} ${car.model}`,
    className: classNamesFromRuleSet(ruleSetBody)[row.declaredClass] ?? row.declaredClass,
  };
}

export type CoDriverInvite = NonNullable<Awaited<ReturnType<typeof getCoDriverInvite>>>;
