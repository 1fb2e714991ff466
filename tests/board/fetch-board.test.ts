import { describe, expect, it } from "vitest";
import type { Board, BoardSnapshot } from "../../lib/board/board-schema";
import { fetchBoard } from "../../lib/board/fetch-board";

const board: Board = {
  eventName: "Test day",
  timeZone: "Europe/London",
  eventDate: "2027-06-05",
  updatedAt: "2027-06-05T09:00:00.000Z",
  cars: [],
  runSheet: null,
  calls: [],
};

/** A fetch that answers like the board route (a fake of the platform's fetch, not a mock). */
function fakeFetch(answer: () => Response) {
  const asked: { url: string; ifNoneMatch: string | null }[] = [];
  const impl = (async (url: string | URL | Request, init?: RequestInit) => {
    asked.push({
      url: String(url),
      ifNoneMatch: new Headers(init?.headers).get("if-none-match"),
    });
    return answer();
  }) as typeof fetch;
  return { impl, asked };
}

describe("fetchBoard", () => {
  it("keeps the server's clock offset and the ETag of a fresh answer", async () => {
    const { impl, asked } = fakeFetch(() =>
      Response.json(board, { headers: { etag: '"board-1"' } }),
    );
    const heardAt = Date.parse("2027-06-05T09:00:03.000Z");
    const got = await fetchBoard({
      eventId: "e1",
      previous: undefined,
      fetchImpl: impl,
      now: () => heardAt,
    });
    expect(asked).toEqual([{ url: "/api/events/e1/board", ifNoneMatch: null }]);
    expect(got).toEqual({ board, etag: '"board-1"', heardAt, offsetMs: -3000 });
  });

  it("sends the ETag it has, and on 304 keeps the board and moves only the time it was heard", async () => {
    const previous: BoardSnapshot = { board, etag: '"board-1"', heardAt: 1000, offsetMs: -3000 };
    const { impl, asked } = fakeFetch(() => new Response(null, { status: 304 }));
    const got = await fetchBoard({ eventId: "e1", previous, fetchImpl: impl, now: () => 9000 });
    expect(asked[0]?.ifNoneMatch).toBe('"board-1"');
    expect(got).toEqual({ ...previous, heardAt: 9000 });
  });

  it("throws on an error answer or no signal, so the last board stays on screen", async () => {
    const previous: BoardSnapshot = { board, etag: '"board-1"', heardAt: 1000, offsetMs: 0 };
    const failing = fakeFetch(() => Response.json({ error: {} }, { status: 503 }));
    await expect(fetchBoard({ eventId: "e1", previous, fetchImpl: failing.impl })).rejects.toThrow(
      /503/,
    );
    const offline = (async () => {
      throw new TypeError("Failed to fetch");
    }) as typeof fetch;
    await expect(fetchBoard({ eventId: "e1", previous, fetchImpl: offline })).rejects.toThrow();
  });
});
