import type { TechRecord } from "../scrutineer/records/record-schema";

/**
 * Where one of this phone's records stands:
 * queued (waiting to go) · sending · sent (the server stored it) · duplicate (the server already
 * had it) · refused (the server said why; kept, never dropped) · needs-sign-in (kept until the
 * scrutineer signs in again).
 */
export type LocalRecordState =
  | "queued"
  | "sending"
  | "sent"
  | "duplicate"
  | "refused"
  | "needs-sign-in";

export type LocalRecord = {
  record: TechRecord;
  eventId: string;
  state: LocalRecordState;
  attempts: number;
  /** Epoch ms before which the outbox leaves it alone (backoff). */
  nextAttemptAt: number;
  lastError: string | null;
  createdAt: number;
  sentAt: number | null;
  /** A photo's image waits in the blob store until it is uploaded. */
  blob: "none" | "waiting" | "uploaded";
};

/** Records still to send (the outbox proper). */
export function isPending(item: LocalRecord): boolean {
  return item.state === "queued" || item.state === "sending" || item.state === "needs-sign-in";
}
