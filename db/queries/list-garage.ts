import "server-only";
import { and, asc, desc, eq, or } from "drizzle-orm";
import { carFileUrl } from "../../lib/cars/car-file-url";
import { classNamesFromRuleSet } from "../../lib/passes/class-names-from-rule-set";
import { getDb } from "../client";
import { cars, entries, events, ruleSetVersions, verdicts } from "../schema";
import { listCarFiles } from "./list-car-files";

/** A person's cars (with their current files; retired ones too, marked), and every entry they drive, co-drive or own, newest event first. */
export async function listGarage({ userId }: { userId: string }) {
  const db = getDb();
  const [carRows, entryRows] = await Promise.all([
    db
      .select({
        id: cars.id,
        make: cars.make,
        model: cars.model,
        year: cars.year,
        colour: cars.colour,
        notes: cars.notes,
        bodyWidthMm: cars.bodyWidthMm,
        roofHeightMm: cars.roofHeightMm,
        retiredAt: cars.retiredAt,
      })
      .from(cars)
      .where(eq(cars.ownerId, userId))
      .orderBy(asc(cars.make), asc(cars.model)),
    db
      .select({
        entryId: entries.id,
        eventId: events.id,
        eventName: events.name,
        eventDate: events.eventDate,
        carNumber: entries.carNumber,
        declaredClass: entries.declaredClass,
        entryStatus: entries.status,
        make: cars.make,
        model: cars.model,
        status: verdicts.status,
        finalClass: verdicts.finalClass,
        reason: verdicts.reason,
        ruleSetBody: ruleSetVersions.body,
      })
      .from(entries)
      .innerJoin(cars, eq(cars.id, entries.carId))
      .innerJoin(events, eq(events.id, entries.eventId))
      .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
      .leftJoin(
        verdicts,
        and(eq(verdicts.eventId, entries.eventId), eq(verdicts.entryId, entries.id)),
      )
      .where(
        or(eq(entries.driverId, userId), eq(entries.coDriverId, userId), eq(cars.ownerId, userId)),
      )
      .orderBy(desc(events.eventDate), asc(entries.carNumber)),
  ]);
  const files = await listCarFiles({ carIds: carRows.map((c) => c.id) });
  return {
    cars: carRows.map((c) => ({
      ...c,
      notes: c.notes ?? "",
      retiredAt: c.retiredAt ? c.retiredAt.toISOString() : null,
      files: files
        .filter((f) => f.carId === c.id)
        .map(({ carId, ...f }) => ({ ...f, url: carFileUrl({ carId, fileId: f.id }) })),
    })),
    entries: entryRows.map(({ ruleSetBody, ...e }) => {
      const names = classNamesFromRuleSet(ruleSetBody);
      return {
        ...e,
        declaredClass: names[e.declaredClass] ?? e.declaredClass,
        finalClass: e.finalClass ? (names[e.finalClass] ?? e.finalClass) : null,
        status: e.status ?? "waiting",
      };
    }),
  };
}

export type Garage = Awaited<ReturnType<typeof listGarage>>;
