import { PASS_PAGE_PATH, PASS_PAGES_CACHE } from "./pass-pages-cache";

/** The pass pages this phone keeps for offline use, as paths with their page titles' event
 *  words where the saved page has them; empty where there is no Cache API. */
export async function listKeptPassPages(): Promise<{ path: string; label: string }[]> {
  if (typeof caches === "undefined") return [];
  if (!(await caches.has(PASS_PAGES_CACHE))) return [];
  const cache = await caches.open(PASS_PAGES_CACHE);
  const kept: { path: string; label: string }[] = [];
  for (const request of await cache.keys()) {
    const path = new URL(request.url).pathname;
    if (!PASS_PAGE_PATH.test(path)) continue;
    const html = await (await cache.match(request))?.text().catch(() => "");
    const label = /data-pass-label="([^"]{1,200})"/.exec(html ?? "")?.[1] ?? "Your pass";
    kept.push({ path, label: label.replace(/&amp;/g, "&").replace(/&#x27;|&#39;/g, "'") });
  }
  return kept;
}
