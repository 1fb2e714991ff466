import type { HttpSession } from "./http-session";

/** What a phone's outbox sends: one batch of records to the event's sync route, as `session`. */
export function postSync(
  session: HttpSession,
  eventId: string,
  deviceId: string,
  records: unknown[],
): Promise<Response> {
  return session.fetch(`/api/events/${eventId}/sync`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ deviceId, records }),
  });
}
