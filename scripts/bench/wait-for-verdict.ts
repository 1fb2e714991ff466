// P2b's probe: what the entrant's page reads (GET /api/entries/<id>/verdict), asked every ~50 ms
// until the verdict was computed at or after the batch's receive time and no recompute of the
// car is still pending.
import type { HttpSession } from "../../tests/support/http-session";

export const VERDICT_POLL_MS = 50;
export const VERDICT_GIVE_UP_MS = 15_000;

/**
 * Milliseconds from `answeredAt` (performance.now() when the sync answer arrived) until the
 * entry's verdict shows `computedAt` ≥ `receivedAt`, or null after 15 s (a miss).
 */
export async function waitForVerdict(opts: {
  session: HttpSession;
  entryId: string;
  receivedAt: string;
  answeredAt: number;
}): Promise<number | null> {
  const wanted = Date.parse(opts.receivedAt);
  const deadline = opts.answeredAt + VERDICT_GIVE_UP_MS;
  while (performance.now() < deadline) {
    const response = await opts.session.fetch(`/api/entries/${opts.entryId}/verdict`);
    if (response.status !== 200)
      throw new Error(
        `GET /api/entries/${opts.entryId}/verdict answered ${response.status}: ${await response.text()}`,
      );
    const result = (await response.json()) as { computedAt: string | null; recomputing?: boolean };
    // Fresh, and counting the batch: no recompute is still pending for the car (the server
    // asks that before it reads the verdict).
    if (
      result.computedAt !== null &&
      Date.parse(result.computedAt) >= wanted &&
      result.recomputing !== true
    )
      return performance.now() - opts.answeredAt;
    await new Promise((resolve) => setTimeout(resolve, VERDICT_POLL_MS));
  }
  return null;
}
