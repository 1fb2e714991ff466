import type { BoardRunSheet } from "../../lib/board/board-schema";
import { shapeBoardRunSheet } from "../../lib/board/shape-board-run-sheet";
import type { TestSheetCar } from "../support/test-run-sheet";
import { testRunSheet } from "../support/test-run-sheet";

// Invented cars for the board's unit tests (demo-style data, never a trade fact).
export const sheetCars: TestSheetCar[] = [
  { n: 7, cls: "street", rank: 0, co: false },
  { n: 11, cls: "street", rank: 0, co: true },
  { n: 23, cls: "club", rank: 1, co: false },
  { n: 31, cls: "club", rank: 1, co: false },
  { n: 42, cls: "open", rank: 2, co: false },
  { n: 58, cls: "open", rank: 2, co: false },
].map(({ n, cls, rank, co }) => ({
  entryId: `entry-${n}`,
  carNumber: n,
  classId: cls,
  className: cls[0]?.toUpperCase() + cls.slice(1),
  classRank: rank,
  driver: { key: `driver-${n}`, name: `Driver Person ${n}` },
  coDriver: co ? { key: `co-${n}`, name: `Co Driver ${n}` } : null,
}));

/** 7 drives in 3 groups, 2 rounds of 20 min with 5 min gaps from 09:00 UTC (10:00 in London
 *  in June). */
export function boardSheet(statuses: Record<string, "cleared" | "held" | "waiting"> = {}) {
  const body = testRunSheet({
    cars: sheetCars,
    groupCount: 3,
    rounds: 2,
    firstStart: new Date("2027-06-05T09:00:00Z"),
    timeZone: "Europe/London",
    eventDate: "2027-06-05",
  });
  const runSheet: BoardRunSheet = shapeBoardRunSheet({
    publication: {
      id: "pub-1",
      eventId: "event-1",
      version: 2,
      publishedAt: "2027-06-05T07:30:00Z",
      publishedBy: "clerk",
      body,
    },
    entries: sheetCars
      .filter((c) => c.carNumber !== 58)
      .map((c) => ({ entryId: c.entryId, status: statuses[c.entryId] ?? "cleared" })),
  });
  return { body, runSheet };
}
