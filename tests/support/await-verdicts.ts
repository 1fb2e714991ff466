import type { PackVerdict } from "@/lib/offline/event-pack-schema";
import type { HttpSession } from "./http-session";

/** The part of a sync answer that says which verdicts the worker is re-deriving. */
export type PendingVerdicts = { verdictsPending: string[]; receivedAt: string };

/**
 * What the phone does after a sync: read the event pack until each entry the answer named has a
 * verdict computed at or after the batch was received, and return those verdicts. Bounded: fails
 * after 15 s with the entries still waiting.
 */
export async function awaitVerdicts(
  session: HttpSession,
  eventId: string,
  answer: PendingVerdicts,
): Promise<PackVerdict[]> {
  const after = Date.parse(answer.receivedAt);
  const deadline = Date.now() + 15_000;
  let waiting = answer.verdictsPending;
  while (true) {
    const response = await session.fetch(`/api/events/${eventId}/pack`, { cache: "no-store" });
    if (!response.ok) throw new Error(`pack answered ${response.status}`);
    const { verdicts, pendingVerdicts = [] } = (await response.json()) as {
      verdicts: PackVerdict[];
      pendingVerdicts?: string[];
    };
    const fresh = verdicts.filter(
      (v) =>
        answer.verdictsPending.includes(v.entryId) &&
        !pendingVerdicts.includes(v.entryId) &&
        Date.parse(v.computedAt) >= after,
    );
    waiting = answer.verdictsPending.filter((id) => !fresh.some((v) => v.entryId === id));
    if (waiting.length === 0) return fresh;
    if (Date.now() > deadline) {
      throw new Error(`no fresh verdict within 15 s for ${waiting.join(", ")}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/**
 * A sync answer read the way the phone reads it: the answer, plus (once the worker has them) the
 * fresh verdicts of the entries it named, as `verdicts`.
 */
export async function readSyncAnswer(
  session: HttpSession,
  eventId: string,
  response: Response,
): Promise<unknown> {
  const body = (await response.json()) as Partial<PendingVerdicts>;
  if (!response.ok || !body.verdictsPending || !body.receivedAt) return body;
  return {
    ...body,
    verdicts: await awaitVerdicts(session, eventId, body as PendingVerdicts),
  };
}
