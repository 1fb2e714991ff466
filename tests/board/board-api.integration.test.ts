import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { Board } from "../../lib/board/board-schema";
import {
  insertTestPublication,
  insertTestSessionCall,
  listTestSheetCars,
  removeTestPublications,
} from "../support/insert-test-publication";
import { queryTestDb } from "../support/query-test-db";
import { makeScratchEntries, removeScratchEntries } from "../support/scratch-entries";
import { testRunSheet } from "../support/test-run-sheet";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

let eventId = "";
let timeZone = "";
let eventDate = "";
let scratch: string[] = [];
const publicationIds: string[] = [];
const callIds: string[] = [];

/** The board as anyone gets it: no cookie, no sign-in. */
const getBoard = (headers: Record<string, string> = {}) =>
  fetch(`${appUrl}/api/events/${eventId}/board`, { headers });

beforeAll(async () => {
  const [event] = await queryTestDb<{ id: string; time_zone: string; event_date: string }>(
    databaseUrl,
    "select id, time_zone, date_format(event_date, '%Y-%m-%d') as event_date from events order by event_date limit 1",
  );
  eventId = event?.id ?? "";
  timeZone = event?.time_zone ?? "";
  eventDate = event?.event_date ?? "";
  // Three cars of this file's own: one held, one with no verdict (waiting), one withdrawn.
  scratch = await makeScratchEntries(databaseUrl, eventId, 3);
  const [held, , withdrawn] = scratch;
  await queryTestDb(
    databaseUrl,
    `insert into verdicts (event_id, entry_id, status, final_class, needs_chief, reason,
                           rule_set_version_id, result, record_count, computed_at)
     select v.event_id, ?, 'held', null, false, 'Held by the test.', v.rule_set_version_id,
            v.result, 0, v.computed_at
       from verdicts v where v.event_id = ? limit 1`,
    [held, eventId],
  );
  await queryTestDb(databaseUrl, "update entries set status = 'withdrawn' where id = ?", [
    withdrawn,
  ]);
});

afterAll(async () => {
  await removeTestPublications(databaseUrl, { publicationIds, callIds });
  await removeScratchEntries(databaseUrl, scratch);
});

describe("GET /api/events/:id/board", () => {
  it("answers anyone, signed in or not, with the tech line and no run sheet before one is published", async () => {
    const response = await getBoard();
    expect(response.status).toBe(200);
    const board = (await response.json()) as Board;
    expect(board.timeZone).toBe(timeZone);
    expect(board.eventDate).toBe(eventDate);
    expect(board.runSheet).toBeNull();
    expect(board.calls).toEqual([]);
    expect(board.cars.length).toBeGreaterThan(0);
  });

  it("shows the latest publication by car number and class, flags cars that may no longer run, never names a driver", async () => {
    const cars = await listTestSheetCars(databaseUrl, eventId, scratch);
    const firstStart = new Date(Date.now() - 5 * 60_000);
    const older = testRunSheet({
      cars: cars.slice(0, 4),
      groupCount: 2,
      rounds: 1,
      firstStart,
      timeZone,
      eventDate,
    });
    const latest = testRunSheet({
      cars,
      groupCount: 3,
      rounds: 2,
      firstStart,
      timeZone,
      eventDate,
    });
    for (const body of [older, latest]) {
      const { id } = await insertTestPublication(databaseUrl, {
        eventId,
        body,
        publishedAt: new Date(),
      });
      publicationIds.push(id);
    }
    const response = await getBoard();
    expect(response.status).toBe(200);
    const text = await response.text();
    const board = JSON.parse(text) as Board;
    const sheet = board.runSheet;
    expect(sheet).not.toBeNull();
    // The latest version is the one shown (a publication is immutable; the next one replaces it).
    expect(sheet?.groups.map((g) => g.name)).toEqual(latest.groups.map((g) => g.name));
    expect(sheet?.sessions).toEqual(latest.sessions);
    const shown = sheet?.groups.flatMap((g) => g.drives) ?? [];
    expect(shown.length).toBe(latest.drives.length);
    for (const group of latest.groups) {
      const onBoard = sheet?.groups.find((g) => g.name === group.name);
      expect(onBoard?.drives.map((d) => d.carNumber)).toEqual(
        group.driveIds.map((id) => latest.drives.find((d) => d.driveId === id)?.carNumber),
      );
    }
    // Car numbers and classes only: the entry list shows no more (DESIGN.md, the paddock board).
    for (const drive of latest.drives) {
      expect(text).not.toContain(drive.driverName);
      expect(text).not.toContain(drive.entryId);
      expect(text).not.toContain(drive.driverKey);
    }
    const [heldId, waitingId, withdrawnId] = scratch;
    const numberOf = (id: string | undefined) => cars.find((c) => c.entryId === id)?.carNumber;
    const flagOf = (id: string | undefined) =>
      shown.find((d) => d.carNumber === numberOf(id))?.flag?.kind;
    // common practice (no source): a car held, sent back to the tech line or withdrawn after
    // the sheet went out does not run until the clerk of course says otherwise.
    expect(flagOf(heldId)).toBe("held");
    expect(flagOf(waitingId)).toBe("waiting");
    expect(flagOf(withdrawnId)).toBe("withdrawn");
    expect(shown.find((d) => d.carNumber === numberOf(withdrawnId))?.status).toBeNull();
    const passed = cars.filter((c) => !scratch.includes(c.entryId));
    for (const car of passed) {
      const drive = shown.find((d) => d.carNumber === car.carNumber);
      expect(drive?.flag).toBeNull();
      expect(drive?.className).toBe(car.className);
    }
    // A shared car's two drives: two tiles, each saying which driver, never in one group.
    const shared = cars.find((c) => c.coDriver !== null);
    if (shared) {
      const drives = shown.filter((d) => d.carNumber === shared.carNumber);
      expect(drives.map((d) => [d.slot, d.shared])).toEqual([
        [1, true],
        [2, true],
      ]);
    }
  });

  it("carries the clerk's calls in order and answers 304 to a screen that has the board already", async () => {
    const first = await getBoard();
    const etag = first.headers.get("etag");
    expect(etag).toMatch(/^"board-/);
    // Source: RFC 9110 §13.1.2 — If-None-Match naming the current tag gets 304 Not Modified.
    const again = await getBoard({ "if-none-match": etag ?? "" });
    expect(again.status).toBe(304);
    expect(await again.text()).toBe("");
    expect(again.headers.get("etag")).toBe(etag);
    // Source: RFC 9110 §13.1.2 — weak comparison: W/"x" matches "x".
    expect((await getBoard({ "if-none-match": `W/${etag}` })).status).toBe(304);

    const at = new Date(Date.now() - 60_000);
    callIds.push(
      await insertTestSessionCall(databaseUrl, {
        eventId,
        sessionKey: "1-1",
        state: "on-track",
        note: null,
        at,
      }),
      await insertTestSessionCall(databaseUrl, {
        eventId,
        sessionKey: "1-1",
        state: "red-flag",
        note: "Oil at the hairpin",
        at: new Date(at.getTime() + 30_000),
      }),
    );
    const changed = await getBoard({ "if-none-match": etag ?? "" });
    expect(changed.status).toBe(200);
    expect(changed.headers.get("etag")).not.toBe(etag);
    const board = (await changed.json()) as Board;
    expect(board.calls.map((c) => [c.sessionKey, c.state, c.note])).toEqual([
      ["1-1", "on-track", null],
      ["1-1", "red-flag", "Oil at the hairpin"],
    ]);
  });

  it("answers 404 for an event that does not exist", async () => {
    const response = await fetch(`${appUrl}/api/events/00000000-0000-7000-8000-000000000000/board`);
    expect(response.status).toBe(404);
  });
});
