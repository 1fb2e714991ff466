import { type FetchPackResult, fetchEventPack } from "./fetch-event-pack";
import { TECH_PAGES_CACHE } from "./outbox-constants";

export type PrepareResult = { pack: FetchPackResult; pagesSaved: number; persisted: boolean };

/**
 * The once-a-day step before going where there is no signal: fetch the event pack into
 * IndexedDB, save the tech line's pages in the service worker's cache, and ask the browser to keep
 * this site's storage.
 */
export async function prepareForOffline(
  eventId: string,
  pagePaths: string[],
): Promise<PrepareResult> {
  const pack = await fetchEventPack(eventId);
  let pagesSaved = 0;
  if (typeof caches !== "undefined") {
    const cache = await caches.open(TECH_PAGES_CACHE);
    for (const path of pagePaths) {
      try {
        const response = await fetch(path, { credentials: "same-origin", cache: "no-store" });
        if (response.ok && !response.redirected) {
          await cache.put(path, response);
          pagesSaved += 1;
        }
      } catch {
        // no signal: the pages already saved stay
      }
    }
  }
  const persisted =
    typeof navigator !== "undefined" && navigator.storage?.persist
      ? await navigator.storage.persist()
      : false;
  return { pack, pagesSaved, persisted };
}
