import "server-only";
import { eq } from "drizzle-orm";
import { classNamesFromRuleSet } from "../../../lib/passes/class-names-from-rule-set";
import { formatEventDay } from "../../../lib/passes/format-event-day";
import type { Tx } from "../../run-transaction";
import { cars, entries, events, ruleSetVersions, users } from "../../schema";

/**
 * An entry with what its e-mails name (event, car, class, driver). The entry's row alone is
 * locked for update first (MariaDB has no `FOR UPDATE OF`; locking the join would lock the event
 * row after the entry, the reverse of the order withdrawing takes them).
 */
export async function loadEntryMailContext(tx: Tx, { entryId }: { entryId: string }) {
  const [locked] = await tx
    .select({ id: entries.id })
    .from(entries)
    .where(eq(entries.id, entryId))
    .for("update");
  if (!locked) return null;
  const [row] = await tx
    .select({
      entryId: entries.id,
      eventId: entries.eventId,
      status: entries.status,
      driverId: entries.driverId,
      coDriverId: entries.coDriverId,
      carNumber: entries.carNumber,
      declaredClass: entries.declaredClass,
      ownerId: cars.ownerId,
      car: { make: cars.make, model: cars.model, year: cars.year },
      eventName: events.name,
      eventDate: events.eventDate,
      ruleSetBody: ruleSetVersions.body,
      driverEmail: users.email,
      driverName: users.name,
    })
    .from(entries)
    .innerJoin(cars, eq(cars.id, entries.carId))
    .innerJoin(events, eq(events.id, entries.eventId))
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .innerJoin(users, eq(users.id, entries.driverId))
    .where(eq(entries.id, entryId));
  if (!row) return null;
  const { ruleSetBody, car, ...rest } = row;
  return {
    ...rest,
    carWords: `${car.year} ${car.make} ${car.model}`,
    className: classNamesFromRuleSet(ruleSetBody)[row.declaredClass] ?? row.declaredClass,
    eventDay: formatEventDay(row.eventDate),
  };
}
