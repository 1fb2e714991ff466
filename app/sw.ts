/// <reference lib="webworker" />
// First, before any schema is made: no eval probe under the worker's CSP.
import "@/lib/zod-without-eval";
import { defaultCache } from "@serwist/next/worker";
import type { PrecacheEntry, SerwistGlobalConfig } from "serwist";
import { ExpirationPlugin, NetworkFirst, NetworkOnly, Serwist } from "serwist";
import { awaitFreshVerdicts } from "@/lib/offline/await-fresh-verdicts";
import { drainOutbox } from "@/lib/offline/drain-outbox";
import { OUTBOX_SYNC_TAG, TECH_PAGES_CACHE } from "@/lib/offline/outbox-constants";
import {
  PASS_PAGE_PATH,
  PASS_PAGES_CACHE,
  PASS_PAGES_MAX_AGE_SECONDS,
} from "@/lib/offline/pass-pages-cache";

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}

declare const self: ServiceWorkerGlobalScope & {
  __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
};

type SyncEvent = ExtendableEvent & { tag: string };

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: true,
  runtimeCaching: [
    {
      // The entrant's pass: network first, the saved copy with no signal, kept for weeks (a pass
      // opened well before the event must open at the gate); the page saves itself on a first visit.
      matcher: ({ request, sameOrigin, url }) =>
        sameOrigin && request.mode === "navigate" && PASS_PAGE_PATH.test(url.pathname),
      handler: new NetworkFirst({
        cacheName: PASS_PAGES_CACHE,
        networkTimeoutSeconds: 4,
        matchOptions: { ignoreSearch: true, ignoreVary: true },
        plugins: [
          new ExpirationPlugin({ maxEntries: 20, maxAgeSeconds: PASS_PAGES_MAX_AGE_SECONDS }),
        ],
      }),
    },
    {
      // Pages people open on the pad (tech line, passes, entries) and the entrant's pre-check:
      // network first, the saved copy when there is no signal. "Prepare for offline" puts the
      // tech line's pages in this cache; the pre-check keeps its own page there.
      matcher: ({ request, sameOrigin, url }) =>
        sameOrigin &&
        request.mode === "navigate" &&
        (/^\/(tech|entries|p|board)\//.test(url.pathname) || url.pathname === "/pre-check"),
      handler: new NetworkFirst({
        cacheName: TECH_PAGES_CACHE,
        networkTimeoutSeconds: 4,
        matchOptions: { ignoreSearch: true, ignoreVary: true },
        plugins: [new ExpirationPlugin({ maxEntries: 80, maxAgeSeconds: 3 * 24 * 3600 })],
      }),
    },
    // Data lives in IndexedDB (lib/offline), never in the HTTP cache.
    {
      matcher: ({ sameOrigin, url }) => sameOrigin && url.pathname.startsWith("/api/"),
      handler: new NetworkOnly(),
    },
    ...defaultCache,
  ],
  fallbacks: {
    entries: [{ url: "/~offline", matcher: ({ request }) => request.destination === "document" }],
  },
});

// Background Sync: the browser wakes us when the phone is back online, even with the tab closed.
// Then, kept alive a little longer, it looks for the server's new verdicts (15 s at most), so an
// open tech-line page gets them even though this worker, not the page, sent the records.
self.addEventListener("sync", (event) => {
  const sync = event as SyncEvent;
  if (sync.tag === OUTBOX_SYNC_TAG)
    sync.waitUntil(
      drainOutbox({ now: () => Date.now() })
        .then((summary) => Promise.all(summary.verdictsPending.map((p) => awaitFreshVerdicts(p))))
        .then(() => undefined),
    );
});

serwist.addEventListeners();
