import {
  insertTestPublication,
  insertTestSessionCall,
  listTestSheetCars,
  removeTestPublications,
} from "../../tests/support/insert-test-publication";
import { queryTestDb } from "../../tests/support/query-test-db";
import { testRunSheet } from "../../tests/support/test-run-sheet";
import { e2eDatabaseUrl } from "./e2e-database-url";

/**
 * A published run sheet for the board's own spec, written straight into the browser tests'
 * database (the clerk's publish action is not what this spec tests): the cars that passed the
 * tech line in 2 groups (a dozen cars each, as a club day's cap allows), 3 rounds of 20 min from
 * 5 min ago, so Group A is on track now, Group B is next and Group A's second round after; and one red flag the clerk lifted on Group A's session. Returns the
 * event and what to remove afterwards.
 */
export async function publishBoardRunSheet() {
  const url = e2eDatabaseUrl();
  const [event] = await queryTestDb<{ id: string; time_zone: string; event_date: string }>(
    url,
    "select id, time_zone, date_format(event_date, '%Y-%m-%d') as event_date from events order by event_date limit 1",
  );
  if (!event) throw new Error("no event in the browser tests' database");
  const now = Date.now();
  const body = testRunSheet({
    cars: await listTestSheetCars(url, event.id),
    groupCount: 2,
    rounds: 3,
    firstStart: new Date(now - 5 * 60_000),
    timeZone: event.time_zone,
    eventDate: event.event_date,
  });
  const { id } = await insertTestPublication(url, {
    eventId: event.id,
    body,
    publishedAt: new Date(now - 30 * 60_000),
  });
  const callIds = [
    await insertTestSessionCall(url, {
      eventId: event.id,
      sessionKey: "1-1",
      state: "on-track",
      note: null,
      at: new Date(now - 5 * 60_000),
    }),
    await insertTestSessionCall(url, {
      eventId: event.id,
      sessionKey: "1-1",
      state: "red-flag",
      note: "Oil at the hairpin",
      at: new Date(now - 4 * 60_000),
    }),
    await insertTestSessionCall(url, {
      eventId: event.id,
      sessionKey: "1-1",
      state: "on-track",
      note: null,
      at: new Date(now - 2 * 60_000),
    }),
  ];
  return {
    eventId: event.id,
    body,
    remove: () => removeTestPublications(url, { publicationIds: [id], callIds }),
  };
}
