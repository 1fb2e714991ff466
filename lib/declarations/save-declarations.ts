import "server-only";
import { getEntryDeclaringFacts } from "../../db/queries/entries/get-entry-declaring-facts";
import { setEntryDeclarations } from "../../db/queries/entries/set-entry-declarations";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { runTransaction } from "../../db/run-transaction";
import { AppError } from "../errors";
import { zodFieldErrors } from "../http/zod-field-errors";
import { RECOMPUTE_VERDICTS } from "../jobs/job-kinds";
import { entryDeclarationsSchema } from "../scrutineer/classes/entry-declarations-schema";
import { mayDeclare } from "./may-declare";

/**
 * Store an entry's declarations and, in the same transaction, queue the recompute of its
 * verdict, so the verdict quotes them. Only the driver or the car's owner, and not on a
 * withdrawn entry or a finished event; then the engine's `entryDeclarationsSchema` parses what
 * was sent (the browser checked it already; this is the check that counts), refusing with field
 * messages under `declarations.` (e.g. `declarations.dynoSheet.ambient`).
 */
export async function saveDeclarations({
  entryId,
  userId,
  declarations,
}: {
  entryId: string;
  userId: string;
  declarations: unknown;
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
  const parsed = entryDeclarationsSchema.safeParse(declarations);
  if (!parsed.success) {
    const fields = Object.fromEntries(
      Object.entries(zodFieldErrors(parsed.error)).map(([path, messages]) => [
        path === "_" ? "declarations" : `declarations.${path}`,
        messages,
      ]),
    );
    throw new AppError("invalid_input", "Some figures need attention.", fields);
  }
  await runTransaction(async (tx) => {
    await setEntryDeclarations({ entryId, declarations: parsed.data }, tx);
    await enqueueJobs(
      [{ kind: RECOMPUTE_VERDICTS, payload: { eventId: facts.eventId, entryIds: [entryId] } }],
      tx,
    );
  });
}
