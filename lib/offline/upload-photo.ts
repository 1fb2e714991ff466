import { get } from "idb-keyval";
import { idbStores } from "./idb-stores";
import type { LocalRecord } from "./local-record";

export type UploadOutcome = "uploaded" | "signed-out" | "retry" | { refused: string };

/** Send one photo's image to the server (which puts it in object storage). Idempotent by key. */
export async function uploadPhoto(
  item: LocalRecord,
  fetchImpl: typeof fetch,
): Promise<UploadOutcome> {
  if (item.record.kind !== "photo") return "uploaded";
  const blob = await get<Blob>(item.record.id, idbStores().blobs);
  if (!blob) return { refused: "The photo's image is missing from this phone." };
  const form = new FormData();
  form.set("recordId", item.record.id);
  form.set("entryId", item.record.entryId);
  form.set("storageKey", item.record.payload.storageKey);
  form.set("file", blob, "photo.jpg");
  let response: Response;
  try {
    response = await fetchImpl(`/api/events/${item.eventId}/uploads`, {
      method: "POST",
      body: form,
      credentials: "same-origin",
    });
  } catch {
    return "retry";
  }
  if (response.ok) return "uploaded";
  if (response.status === 401) return "signed-out";
  if (response.status >= 500 || response.status === 408 || response.status === 429) return "retry";
  const body = (await response.json().catch(() => null)) as { error?: { message?: string } } | null;
  return { refused: body?.error?.message ?? `The server refused the photo (${response.status}).` };
}
