import "server-only";
import { eq } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { getDb } from "../client";
import { entries, users } from "../schema";

/** The names of an entry's driver and co-driver (the address where a person gave no name), for
 *  the entrant's own printed pass. */
export async function getEntryDriverNames({ entryId }: { entryId: string }): Promise<string[]> {
  const coDriver = alias(users, "co_driver");
  const [row] = await getDb()
    .select({
      driverName: users.name,
      driverEmail: users.email,
      coDriverName: coDriver.name,
      coDriverEmail: coDriver.email,
    })
    .from(entries)
    .innerJoin(users, eq(users.id, entries.driverId))
    .leftJoin(coDriver, eq(coDriver.id, entries.coDriverId))
    .where(eq(entries.id, entryId))
    .limit(1);
  if (!row) return [];
  const names = [row.driverName?.trim() || row.driverEmail];
  const co = row.coDriverName?.trim() || row.coDriverEmail;
  if (co) names.push(co);
  return names;
}
