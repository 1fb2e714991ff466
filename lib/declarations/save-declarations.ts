import "server-only";
import { getEntryDeclaringFacts } from "../../db/queries/entries/get-entry-declaring-facts";
import { setEntryDeclarations } from "../../db/queries/entries/set-entry-declarations";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { runTransaction } from "../../db/run-transaction";
import { AppError } from "../errors";
import { RECOMPUTE_VERDICTS } from "../jobs/job-kinds";
import type { EntryDeclarations } from "../scrutineer/classes/entry-declarations-schema";
import { mayDeclare } from "./may-declare";

/**
 * Store an entry's declarations (already parsed by `entryDeclarationsSchema`) and, in the same
 * transaction, queue the recompute of its verdict, so the verdict quotes them. Only the driver
 * or the car's owner; not on a withdrawn entry or a finished event.
 */
export async function saveDeclarations({
  entryId,
  userId,
  declarations,
}: {
  entryId: string;
  userId: string;
  declarations: EntryDeclarations;
}): Promise<void> {
  const facts = await getEntryDeclaringFacts({ entryId });
  if (!facts) throw new AppError("not_found", "No such entry.");
  if (!mayDeclare(facts, userId)) {
    throw new AppError(
      "forbidden",
      "Only the entry's driver or the car's owner declares: your account does not allow that.",
    );
  }
  if (facts.entryStatus === "withdrawn") {
    throw new AppError("conflict", "This entry was withdrawn; its declarations are closed.");
  }
  if (facts.eventStatus === "finished") {
    throw new AppError("conflict", "This event is over; its declarations are closed.");
  }
  await runTransaction(async (tx) => {
    await setEntryDeclarations({ entryId, declarations }, tx);
    await enqueueJobs(
      [{ kind: RECOMPUTE_VERDICTS, payload: { eventId: facts.eventId, entryIds: [entryId] } }],
      tx,
    );
  });
}
