// One phone's sync request, timed: the batch goes out, the answer is read, every record checked.
import type { HttpSession } from "../../tests/support/http-session";
import { makeSyncBatch, syncBody } from "./make-sync-batch";

export type Phone = {
  session: HttpSession;
  officialId: string;
  deviceId: string;
  /** The cars this phone's batch is for. */
  entryIds: readonly string[];
};

export type PhoneAnswer = {
  ms: number;
  /** performance.now() when the whole answer had arrived. */
  answeredAt: number;
  ok: boolean;
  problem: string | null;
  receivedAt: string | null;
  /** Entries whose verdict will change: `verdictsPending` where the server queues recomputes,
   *  else the cars whose records were stored (the answer then carries their verdicts already). */
  pendingEntryIds: string[];
  queued: boolean;
};

type SyncAnswer = {
  results: { id: string | null; status: string; reason?: string }[];
  receivedAt: string;
  verdictsPending?: string[];
};

/** Build the body first, then time the request from send to the last byte of the answer. */
export async function postPhoneBatch(eventId: string, phone: Phone): Promise<PhoneAnswer> {
  const records = makeSyncBatch({
    entryIds: phone.entryIds,
    officialId: phone.officialId,
    deviceId: phone.deviceId,
  });
  return sendPhoneBody(eventId, phone, syncBody(phone.deviceId, records));
}

/** Time one prepared body (the burst builds every body before the first one goes). */
export async function sendPhoneBody(
  eventId: string,
  phone: Phone,
  body: string,
): Promise<PhoneAnswer> {
  const started = performance.now();
  try {
    const response = await phone.session.fetch(`/api/events/${eventId}/sync`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body,
    });
    const text = await response.text();
    const answeredAt = performance.now();
    const base = { ms: answeredAt - started, answeredAt };
    if (response.status !== 200)
      return {
        ...base,
        ok: false,
        problem: `HTTP ${response.status}: ${text.slice(0, 300)}`,
        receivedAt: null,
        pendingEntryIds: [],
        queued: false,
      };
    const answer = JSON.parse(text) as SyncAnswer;
    const refused = answer.results.filter((r) => r.status !== "stored");
    const queued = Array.isArray(answer.verdictsPending);
    return {
      ...base,
      ok: refused.length === 0,
      problem:
        refused.length === 0
          ? null
          : `${refused.length} records not stored: ${refused[0]?.status} ${refused[0]?.reason ?? ""}`,
      receivedAt: answer.receivedAt,
      pendingEntryIds: answer.verdictsPending ?? [...new Set(phone.entryIds)],
      queued,
    };
  } catch (error) {
    const answeredAt = performance.now();
    return {
      ms: answeredAt - started,
      answeredAt,
      ok: false,
      problem: error instanceof Error ? error.message : String(error),
      receivedAt: null,
      pendingEntryIds: [],
      queued: false,
    };
  }
}
