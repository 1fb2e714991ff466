import "server-only";
import { eq } from "drizzle-orm";
import type { EntryDeclarations } from "../../../lib/scrutineer/classes/entry-declarations-schema";
import type { Tx } from "../../run-transaction";
import { entries } from "../../schema";

/** Replace an entry's declarations, in the caller's transaction. */
export async function setEntryDeclarations(
  { entryId, declarations }: { entryId: string; declarations: EntryDeclarations },
  tx: Tx,
): Promise<void> {
  await tx.update(entries).set({ declarations }).where(eq(entries.id, entryId));
}
