import { announceChange } from "./announce-change";
import { listLocalRecords } from "./list-local-records";
import { updateLocalRecord } from "./update-local-record";

/** After a fresh sign-in: records held for sign-in go back in the queue, to be sent now. */
export async function requeueSignedOutRecords(eventId: string): Promise<number> {
  const held = (await listLocalRecords(eventId)).filter((r) => r.state === "needs-sign-in");
  for (const item of held) {
    await updateLocalRecord(item.record.id, (r) => ({
      ...r,
      state: "queued",
      nextAttemptAt: 0,
      lastError: null,
    }));
  }
  if (held.length > 0) announceChange({ type: "records", eventId });
  return held.length;
}
