import { describe, expect, it } from "vitest";
import { isBoardPath } from "../../components/is-board-path";
import { boardEtag, etagMatches } from "../../lib/board/board-etag";
import type { Board } from "../../lib/board/board-schema";
import { lastHeardWords } from "../../lib/board/last-heard-words";
import { formatWallClock, formatWallClockSpan } from "../../lib/paddock/format-wall-clock";

describe("lastHeardWords", () => {
  it("says how old the board is in whole minutes, then hours", () => {
    expect(lastHeardWords(0)).toBe("Last heard from the server just now");
    expect(lastHeardWords(59_999)).toBe("Last heard from the server just now");
    expect(lastHeardWords(4 * 60_000 + 30_000)).toBe("Last heard from the server 4 min ago");
    expect(lastHeardWords(60 * 60_000)).toBe("Last heard from the server 1 h ago");
    expect(lastHeardWords(125 * 60_000)).toBe("Last heard from the server 2 h 5 min ago");
    // A screen whose clock stepped back does not claim the future.
    expect(lastHeardWords(-90_000)).toBe("Last heard from the server just now");
  });
});

describe("formatWallClock", () => {
  it("prints the venue's wall-clock time on either side of a clock change", () => {
    // Source: IANA tz database (europe), Europe/London: GMT until 01:00 UTC on the last Sunday
    // in March (28 March 2027), BST (UTC+1) after; back at 01:00 UTC on 31 October 2027.
    expect(formatWallClock("2027-03-28T00:30:00Z", "Europe/London")).toBe("00:30");
    expect(formatWallClock("2027-03-28T01:30:00Z", "Europe/London")).toBe("02:30");
    expect(formatWallClock("2027-10-31T00:30:00Z", "Europe/London")).toBe("01:30");
    expect(formatWallClock("2027-10-31T01:30:00Z", "Europe/London")).toBe("01:30");
    // Source: IANA tz database (australasia), Australia/Adelaide is UTC+9:30 in winter (ACST).
    expect(
      formatWallClockSpan("2027-06-05T00:00:00Z", "2027-06-05T00:20:00Z", "Australia/Adelaide"),
    ).toBe("09:30–09:50");
    expect(formatWallClock("not a time", "Europe/London")).toBe("--:--");
  });
});

describe("board ETag", () => {
  const board: Board = {
    eventName: "Test day",
    timeZone: "Europe/London",
    eventDate: "2027-06-05",
    updatedAt: "2027-06-05T09:00:00.000Z",
    cars: [{ carNumber: 7, declaredClass: "Street", finalClass: "Street", status: "cleared" }],
    runSheet: null,
    calls: [],
  };

  it("stays the same when only the read time moves, and changes with what the board shows", () => {
    const tag = boardEtag(board);
    expect(boardEtag({ ...board, updatedAt: "2027-06-05T09:00:05.000Z" })).toBe(tag);
    const held = { ...board, cars: [{ ...board.cars[0], status: "held" as const }] } as Board;
    expect(boardEtag(held)).not.toBe(tag);
    // Source: RFC 9110 §8.8.3 — an entity tag is a quoted string.
    expect(tag).toMatch(/^"[^"]+"$/);
  });

  it("matches If-None-Match as RFC 9110 §13.1.2 says: a list, weak comparison, and *", () => {
    const tag = boardEtag(board);
    expect(etagMatches(tag, tag)).toBe(true);
    expect(etagMatches(`"other", ${tag}`, tag)).toBe(true);
    expect(etagMatches(`W/${tag}`, tag)).toBe(true);
    expect(etagMatches("*", tag)).toBe(true);
    expect(etagMatches('"other"', tag)).toBe(false);
    expect(etagMatches(null, tag)).toBe(false);
  });
});

describe("isBoardPath", () => {
  it("is the board's own page only", () => {
    expect(isBoardPath("/board/0190a1b2-0000-7000-8000-000000000001")).toBe(true);
    expect(isBoardPath("/board/x/")).toBe(true);
    expect(isBoardPath("/boards")).toBe(false);
    expect(isBoardPath("/clerk/x")).toBe(false);
    expect(isBoardPath(null)).toBe(false);
  });
});
