import type { BrowserContext, Route } from "@playwright/test";

/** A request the switch stopped while "offline", and whether the service worker made it. */
export type BlockedRequest = { url: string; fromServiceWorker: boolean };

/**
 * Takes a browser context off the network for its pages AND its service worker, and back on.
 * `context.setOffline` alone emulates no signal for the pages, but in headless Chromium the
 * service worker's own fetches (Background Sync draining the outbox) can still reach the server.
 * So every request to the app is also aborted with a context route: Playwright routes requests
 * a service worker makes itself (Chromium; "Service Workers" in Playwright's docs), and a route
 * does not depend on what the browser believes about its connection. `blocked` lists what was
 * stopped, so a test can tell which side tried.
 */
export async function takeOffline(context: BrowserContext, appUrl: string) {
  const origin = new URL(appUrl).origin;
  const blocked: BlockedRequest[] = [];
  const matches = (url: URL) => url.origin === origin;
  const stop = async (route: Route) => {
    const request = route.request();
    blocked.push({ url: request.url(), fromServiceWorker: request.serviceWorker() !== null });
    await route.abort("internetdisconnected");
  };
  await context.route(matches, stop);
  await context.setOffline(true);
  return {
    blocked,
    /** Signal again: stop blocking, then let the browser say it is online. */
    async backOnline() {
      await context.unroute(matches, stop);
      await context.setOffline(false);
    },
  };
}
