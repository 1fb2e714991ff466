import "server-only";
import { eq, sql } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { Tx } from "../../run-transaction";
import { users } from "../../schema";

/**
 * Create an account for a (normalized) address unless one exists. The unique key on `email`
 * decides, so two sign-ups for the same address at once make one account.
 * @returns whether this call created it
 */
export async function insertUserIfNew(
  tx: Tx,
  opts: { email: string; name: string; passwordHash: string | null },
): Promise<{ created: boolean }> {
  const id = uuidv7();
  await tx
    .insert(users)
    .values({
      id,
      email: opts.email,
      name: opts.name,
      passwordHash: opts.passwordHash,
      createdAt: new Date(),
    })
    .onDuplicateKeyUpdate({ set: { id: sql`${users.id}` } });
  // Read back whose row the address has: ours only if the insert made it. (Not `affectedRows`:
  // with mysql2's FOUND_ROWS flag a duplicate left as it was counts as 1 too.)
  const [row] = await tx.select({ id: users.id }).from(users).where(eq(users.email, opts.email));
  return { created: row?.id === id };
}
