import "server-only";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { listEventEntryIds } from "../../db/queries/list-event-entry-ids";
import { insertReinspection } from "../../db/queries/reinspections/insert-reinspection";
import { runTransaction } from "../../db/run-transaction";
import { AppError } from "../errors";
import { RECOMPUTE_VERDICTS } from "../jobs/job-kinds";

/**
 * Send a car back to the tech line after an incident or a protest: the request is stored and the
 * car's verdict recomputed (it waits) in one transaction, so a request never stands without the
 * verdict following it.
 */
export async function askReinspection(request: {
  eventId: string;
  entryId: string;
  cause: "incident" | "protest" | "other";
  askedBy: string;
  askedAt: Date;
  reason: string;
  createdBy: string;
  now: Date;
}): Promise<string> {
  const { now, ...row } = request;
  const known = await listEventEntryIds({ eventId: request.eventId, entryIds: [request.entryId] });
  if (!known.has(request.entryId)) throw new AppError("not_found", "No such car in this event.");
  return runTransaction(async (tx) => {
    const id = await insertReinspection(tx, { ...row, createdAt: now });
    await enqueueJobs(
      [
        {
          kind: RECOMPUTE_VERDICTS,
          payload: { eventId: request.eventId, entryIds: [request.entryId] },
        },
      ],
      tx,
    );
    return id;
  });
}
