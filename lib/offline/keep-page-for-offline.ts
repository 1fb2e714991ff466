import { TECH_PAGES_CACHE } from "./outbox-constants";

/**
 * Save the page at `path` in the service worker's page cache (`cacheName`, the tech line's pages
 * unless told) once the worker runs, so it opens with no signal even when this was its first
 * visit (the worker was not yet in charge of that first load, so it could not keep it). Does
 * nothing where there is no service worker or Cache API.
 */
export async function keepPageForOffline(
  path: string,
  cacheName: string = TECH_PAGES_CACHE,
): Promise<void> {
  if (typeof navigator === "undefined" || !("serviceWorker" in navigator)) return;
  if (typeof caches === "undefined") return;
  await navigator.serviceWorker.ready;
  const cache = await caches.open(cacheName);
  if (await cache.match(path, { ignoreSearch: true, ignoreVary: true })) return;
  await cache.add(path);
}
