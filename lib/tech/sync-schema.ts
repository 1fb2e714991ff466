import { z } from "zod";

/** Most records a phone may send in one batch; the outbox sends smaller batches. */
export const MAX_SYNC_BATCH = 200;

/** POST /api/events/[eventId]/sync — the outer shape; each record is checked on its own. */
export const syncRequestSchema = z.strictObject({
  deviceId: z.string().min(1).max(64),
  records: z.array(z.unknown()).min(1, "Send at least one record").max(MAX_SYNC_BATCH),
});

export type SyncRecordResult =
  | { id: string; status: "stored" | "duplicate" }
  | { id: string | null; status: "refused"; reason: string };

export type SyncResponse = {
  results: SyncRecordResult[];
  /** Entries that got new records: the worker is re-deriving their verdicts (the phone's next
   *  pack refresh brings them). */
  verdictsPending: string[];
  receivedAt: string;
};
