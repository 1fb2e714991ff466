import type { EventPack } from "./event-pack-schema";
import { fetchEventPack } from "./fetch-event-pack";
import { loadEventPack } from "./load-event-pack";

/** From a sync answer: the server's worker will recompute these entries' verdicts, after the
 *  batch was received at `receivedAt` (server time, ISO 8601). */
export type PendingVerdicts = { eventId: string; entryIds: string[]; receivedAt: string };

/** "failed": something threw — the phone's storage, or a pack that does not read (logged). A
 *  server error answer is not a failure: the loop looks again. */
export type FreshVerdictsOutcome = "fresh" | "timed-out" | "offline" | "signed-out" | "failed";

/** The first look, soon after the sync answer: the worker usually has the verdict by then. */
export const FIRST_POLL_MS = 300;
/** Stop looking this long after the last sync answer that asked: the next refresh brings it. */
export const GIVE_UP_MS = 15_000;

type Options = {
  fetchImpl?: typeof fetch;
  isOnline?: () => boolean;
  now?: () => number;
};

type Loop = {
  /** Entry id → the receive time (ms) its verdict must be computed at or after. */
  wanted: Map<string, number>;
  deadline: number;
  delay: number;
  /** Cut the current wait short: a new sync answer wants a look soon. */
  hurry: () => void;
};

// One poll loop per event in this context (page or service worker); a new answer joins it.
const loops = new Map<string, { loop: Loop; done: Promise<FreshVerdictsOutcome> }>();

/**
 * After a sync, refresh the event pack (a partial one: ETag and cursor) until every pending
 * entry's stored verdict was computed at or after its batch's receive time: a first look after
 * 300 ms, then waits doubling (0.6 s, 1.2 s, 2.4 s …) up to 15 s after the last answer. Stops at
 * once with no signal or an expired sign-in; never polls offline. A call while the event's loop
 * runs adds its entries to that loop (and brings its next look forward) instead of starting
 * another. The refreshed pack reaches the page through `saveEventPack`'s announcement.
 */
export function awaitFreshVerdicts(
  pending: PendingVerdicts,
  options: Options = {},
): Promise<FreshVerdictsOutcome> {
  const now = options.now ?? Date.now;
  const running = loops.get(pending.eventId);
  if (running) {
    const { loop, done } = running;
    want(loop.wanted, pending);
    loop.deadline = Math.max(loop.deadline, now() + GIVE_UP_MS);
    loop.delay = FIRST_POLL_MS;
    loop.hurry();
    return done;
  }
  const loop: Loop = {
    wanted: new Map(),
    deadline: now() + GIVE_UP_MS,
    delay: FIRST_POLL_MS,
    hurry: () => {},
  };
  want(loop.wanted, pending);
  // poll() reaches its first await before it could remove the entry set here.
  const done = poll(pending.eventId, loop, { ...options, now });
  loops.set(pending.eventId, { loop, done });
  return done;
}

async function poll(
  eventId: string,
  loop: Loop,
  {
    fetchImpl = fetch,
    isOnline = () => typeof navigator === "undefined" || navigator.onLine !== false,
    now,
  }: Options & { now: () => number },
): Promise<FreshVerdictsOutcome> {
  try {
    const stored = await loadEventPack(eventId);
    if (stored && isFresh(stored, loop.wanted)) return "fresh";
    for (;;) {
      const left = loop.deadline - now();
      if (left <= 0) return "timed-out";
      await pause(loop, Math.min(loop.delay, left));
      loop.delay *= 2;
      if (!isOnline()) return "offline";
      const result = await fetchEventPack(eventId, { fetchImpl });
      if (result.kind === "offline") return "offline";
      if (result.kind === "signed-out") return "signed-out";
      // "error" (the server answered something other than 200 or 304): look again until the end.
      if (result.pack && isFresh(result.pack, loop.wanted)) return "fresh";
    }
  } catch (error) {
    console.error("[outbox] waiting for the server's verdicts failed", error);
    return "failed";
  } finally {
    // In the same turn as the outcome: a later answer starts a new loop, never joins a done one.
    loops.delete(eventId);
  }
}

function want(wanted: Map<string, number>, pending: PendingVerdicts): void {
  const receivedAt = Date.parse(pending.receivedAt);
  for (const entryId of pending.entryIds)
    wanted.set(entryId, Math.max(wanted.get(entryId) ?? receivedAt, receivedAt));
}

function pause(loop: Loop, ms: number): Promise<void> {
  return new Promise((resolve) => {
    let timer = setTimeout(done, ms);
    function done() {
      loop.hurry = () => {};
      resolve();
    }
    loop.hurry = () => {
      clearTimeout(timer);
      timer = setTimeout(done, FIRST_POLL_MS);
    };
  });
}

/**
 * Every wanted entry still in the event has a verdict computed at or after its receive time, and
 * none is still being re-derived (a verdict computed a moment after the batch was stamped may
 * have been read before the batch committed; the batch's own job is then still pending).
 */
function isFresh(
  pack: Pick<EventPack, "entries" | "verdicts" | "pendingVerdicts">,
  wanted: Map<string, number>,
) {
  const computedAt = new Map(pack.verdicts.map((v) => [v.entryId, Date.parse(v.computedAt)]));
  const entered = new Set(pack.entries.map((e) => e.entryId));
  const pending = new Set(pack.pendingVerdicts ?? []);
  for (const [entryId, receivedAt] of wanted) {
    if (!entered.has(entryId)) continue; // withdrawn since: no verdict will come
    if (pending.has(entryId)) return false;
    const at = computedAt.get(entryId);
    if (at === undefined || at < receivedAt) return false;
  }
  return true;
}
