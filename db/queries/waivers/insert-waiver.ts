import "server-only";
import type { Tx } from "../../run-transaction";
import { waivers } from "../../schema";

/** Store one driver's acceptance of an entry's waiver, in the caller's transaction. */
export async function insertWaiver(row: typeof waivers.$inferInsert, tx: Tx): Promise<void> {
  await tx.insert(waivers).values(row);
}
