import type { BrowserContext } from "@playwright/test";

/** The held request: the record ids it carried and, when it went on to the server, the answer
 *  the browser never got. */
export type HeldSync = {
  ids: string[];
  answer: { results: { id: string; status: string }[] } | null;
};

/**
 * Hold the `nth` `POST …/sync` a context makes (counted from now; earlier routes such as the
 * network switch's see requests first while they are in place): it gets no answer until
 * `release()`. With `toServer`, it first goes on to the server, which stores the batch — as when
 * the signal or the browser goes between the server's commit and its answer. Every other sync
 * request passes untouched. Register before `takeOffline` so the switch's route runs first.
 */
export async function holdSyncRequest(
  context: BrowserContext,
  { nth, toServer }: { nth: number; toServer: boolean },
): Promise<{ held: Promise<HeldSync>; release: () => void }> {
  let seen = 0;
  let onHeld: (held: HeldSync) => void = () => undefined;
  const held = new Promise<HeldSync>((resolve) => {
    onHeld = resolve;
  });
  let release: () => void = () => undefined;
  const released = new Promise<void>((resolve) => {
    release = resolve;
  });
  await context.route(
    (url) => /^\/api\/events\/[^/]+\/sync$/.test(url.pathname),
    async (route) => {
      const request = route.request();
      if (request.method() !== "POST") return route.fallback();
      seen += 1;
      if (seen !== nth) return route.fallback();
      const ids = ((request.postDataJSON() as { records: { id: string }[] }).records ?? []).map(
        (r) => r.id,
      );
      const answer = toServer ? ((await (await route.fetch()).json()) as HeldSync["answer"]) : null;
      onHeld({ ids, answer });
      await released;
      // By now the page that asked has reloaded, or its browser has closed: nothing to answer.
      await route.abort("connectionreset").catch(() => undefined);
    },
  );
  return { held, release };
}
