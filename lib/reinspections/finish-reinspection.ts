import "server-only";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { closeReinspection } from "../../db/queries/reinspections/close-reinspection";
import { runTransaction } from "../../db/run-transaction";
import { RECOMPUTE_VERDICTS } from "../jobs/job-kinds";

/** The chief scrutineer closes a re-inspection: the car's verdict is derived from its records
 *  again (queued in the same transaction). */
export async function finishReinspection(args: {
  eventId: string;
  reinspectionId: string;
  closedBy: string;
  closedAt: Date;
  note: string;
}): Promise<string> {
  return runTransaction(async (tx) => {
    const entryId = await closeReinspection(tx, args);
    await enqueueJobs(
      [{ kind: RECOMPUTE_VERDICTS, payload: { eventId: args.eventId, entryIds: [entryId] } }],
      tx,
    );
    return entryId;
  });
}
