import type { BrowserContext } from "@playwright/test";

/** One sync request the browser got an answer to: its status and the record ids it carried. */
export type SyncAnswer = { status: number; ids: string[]; fromServiceWorker: boolean };

const isSync = (url: string, method: string) =>
  method === "POST" && /^\/api\/events\/[^/]+\/sync$/.test(new URL(url).pathname);

/**
 * Note every answered `POST …/sync` in a context, from the page or its service worker. A request
 * held by a route and never answered (the page reloaded, the browser closed) is not listed.
 */
export function watchSyncAnswers(context: BrowserContext): SyncAnswer[] {
  const answers: SyncAnswer[] = [];
  context.on("response", (response) => {
    const request = response.request();
    if (!isSync(request.url(), request.method())) return;
    const body = request.postDataJSON() as { records?: { id: string }[] } | null;
    answers.push({
      status: response.status(),
      ids: (body?.records ?? []).map((r) => r.id),
      fromServiceWorker: request.serviceWorker() !== null,
    });
  });
  return answers;
}
