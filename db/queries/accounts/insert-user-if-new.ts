import "server-only";
import { sql } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { Tx } from "../../run-transaction";
import { users } from "../../schema";

/**
 * Create an account for a (normalized) address unless one exists. One statement, so two sign-ups
 * for the same address at once make one account: the unique key on `email` decides.
 * @returns whether this call created it
 */
export async function insertUserIfNew(
  tx: Tx,
  opts: { email: string; name: string; passwordHash: string | null },
): Promise<{ created: boolean }> {
  const [result] = await tx
    .insert(users)
    .values({
      id: uuidv7(),
      email: opts.email,
      name: opts.name,
      passwordHash: opts.passwordHash,
      createdAt: new Date(),
    })
    .onDuplicateKeyUpdate({ set: { id: sql`${users.id}` } });
  // MariaDB: 1 row affected for an insert, 0 when the duplicate key left the row as it was.
  return { created: result.affectedRows === 1 };
}
