// P6's burst: every phone posts its batch at the same moment; with `watch`, each phone then
// polls its cars' verdicts the moment its own answer arrives (P2b).
import { makeSyncBatch, syncBody } from "./make-sync-batch";
import { type Phone, type PhoneAnswer, sendPhoneBody } from "./post-phone-batch";

export type BurstResult = {
  answers: PhoneAnswer[];
  /** Per phone: ms from its answer until every car's verdict was visible, null for a miss;
   *  empty without `watch`. */
  visibleMs: (number | null)[];
};

/** Build every body first, then send them all at once and wait for every answer (and poll). */
export async function burstPhones(
  eventId: string,
  phones: readonly Phone[],
  watch?: (entryId: string, answer: PhoneAnswer) => Promise<number | null>,
): Promise<BurstResult> {
  const bodies = phones.map((phone) =>
    syncBody(
      phone.deviceId,
      makeSyncBatch({
        entryIds: phone.entryIds,
        officialId: phone.officialId,
        deviceId: phone.deviceId,
      }),
    ),
  );
  const results = await Promise.all(
    phones.map(async (phone, i) => {
      const answer = await sendPhoneBody(eventId, phone, bodies[i] ?? "");
      if (!watch) return { answer, visible: null };
      if (!answer.ok) return { answer, visible: null };
      const times = await Promise.all(answer.pendingEntryIds.map((id) => watch(id, answer)));
      const visible = times.some((t) => t === null) ? null : Math.max(0, ...(times as number[]));
      return { answer, visible };
    }),
  );
  return {
    answers: results.map((r) => r.answer),
    visibleMs: watch ? results.map((r) => r.visible) : [],
  };
}
