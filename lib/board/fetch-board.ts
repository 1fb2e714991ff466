import type { Board, BoardSnapshot } from "./board-schema";

/**
 * Ask the server for the board. With a previous answer, send its ETag: a 304 keeps the board and
 * only moves `heardAt`. No signal or an error answer throws, so TanStack Query keeps the last
 * board on screen and reports the error.
 * @param now this screen's clock (ms), a parameter so tests can set it
 */
export async function fetchBoard({
  eventId,
  previous,
  fetchImpl = fetch,
  now = () => Date.now(),
  signal,
}: {
  eventId: string;
  previous: BoardSnapshot | undefined;
  fetchImpl?: typeof fetch;
  now?: () => number;
  signal?: AbortSignal;
}): Promise<BoardSnapshot> {
  const response = await fetchImpl(`/api/events/${eventId}/board`, {
    headers: previous?.etag ? { "if-none-match": previous.etag } : {},
    cache: "no-store",
    signal,
  });
  const heardAt = now();
  if (response.status === 304 && previous) return { ...previous, heardAt };
  if (!response.ok) throw new Error(`The board answered ${response.status}.`);
  const board = (await response.json()) as Board;
  const serverMs = Date.parse(board.updatedAt);
  return {
    board,
    etag: response.headers.get("etag"),
    heardAt,
    offsetMs: Number.isNaN(serverMs) ? 0 : serverMs - heardAt,
  };
}
