import { eventPackSchema } from "./event-pack-schema";
import { loadEventPack } from "./load-event-pack";
import { type StoredPack, saveEventPack } from "./save-event-pack";

export type FetchPackResult =
  | { kind: "fresh" | "unchanged"; pack: StoredPack; message: null }
  | { kind: "signed-out" | "offline" | "error"; pack: StoredPack | undefined; message: string };

/**
 * Fetch the event pack and store it. With a stored pack, ask only for what changed (ETag, and the
 * cursor for the records and verdicts that arrived since); without signal, keep what the phone has.
 */
export async function fetchEventPack(
  eventId: string,
  {
    now = () => new Date(),
    fetchImpl = fetch,
  }: { now?: () => Date; fetchImpl?: typeof fetch } = {},
): Promise<FetchPackResult> {
  const stored = await loadEventPack(eventId);
  // Format 2: this phone merges verdicts by entry, so a partial pack may carry only new ones.
  const query = new URLSearchParams({ format: "2" });
  if (stored?.recordsCursor) {
    query.set("since", stored.recordsCursor);
    // What this phone holds: the server leaves those out of the refresh when they are current.
    if (stored.entriesTag) query.set("entries", stored.entriesTag);
    query.set("rules", stored.ruleSetVersionId);
  }
  let response: Response;
  try {
    response = await fetchImpl(`/api/events/${eventId}/pack?${query}`, {
      headers: stored ? { "if-none-match": stored.etag } : {},
      credentials: "same-origin",
      cache: "no-store",
    });
  } catch {
    return {
      kind: "offline",
      pack: stored,
      message: "No signal: using the event pack saved on this phone.",
    };
  }
  if (response.status === 304 && stored) return { kind: "unchanged", pack: stored, message: null };
  if (response.status === 401) {
    return {
      kind: "signed-out",
      pack: stored,
      message: "Sign in again to refresh the event pack.",
    };
  }
  if (!response.ok) {
    return {
      kind: "error",
      pack: stored,
      message: `The server answered ${response.status}; kept the saved pack.`,
    };
  }
  const pack = eventPackSchema.parse(await response.json());
  return { kind: "fresh", pack: await saveEventPack(pack, now()), message: null };
}
