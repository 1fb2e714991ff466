// Bad input for the entering actions (issue 11): the entry form, the co-driver invitation and the
// answer to it. Generated malformed forms (fast-check) → an error state in words, never a 5xx, and
// no row changed in any table. The same contract as bad-input.integration.test.ts.
import fc from "fast-check";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, inject, it } from "vitest";
import {
  ACCEPT,
  DECLINE,
  ENTER,
  type Entrant,
  enter,
  INVITE,
  makeEntrants,
  makeTestEvent,
} from "../entering/entering-fixtures";
import { callServerAction } from "../support/call-server-action";
import { countAllRows } from "../support/count-all-rows";
import { isReadable, junkValue } from "../support/malformed";
import { queryTestDb } from "../support/query-test-db";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const RUNS = 150;
// The worker may be sending the fixture's own mails meanwhile: its tables move by themselves.
const COUNTERS = ["rate_limits", "sign_in_limits", "jobs", "mail_log"];

let who: Entrant;
let event: { id: string; slug: string };
let entryId: string;
let rowsBefore: Record<string, number>;

beforeAll(async () => {
  event = await makeTestEvent(databaseUrl, { capacity: 5, label: "badinput" });
  [who] = (await makeEntrants(appUrl, databaseUrl, { count: 1, label: "badinput" })) as [Entrant];
  await enter(who, event);
  const [row] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from entries where event_id = ?",
    [event.id],
  );
  if (!row) throw new Error("no entry");
  entryId = row.id;
}, 60_000);
afterAll(async () => {
  await queryTestDb(databaseUrl, "update events set status = 'finished' where id = ?", [event.id]);
});
beforeEach(async () => {
  rowsBefore = await countAllRows(databaseUrl, COUNTERS);
});
afterEach(async () => {
  expect(await countAllRows(databaseUrl, COUNTERS)).toEqual(rowsBefore);
});

const junkText = junkValue.map((v) => (typeof v === "string" ? v : (JSON.stringify(v) ?? "")));

function expectRefusal(answer: { status: number; text: string }) {
  if (answer.status === 413) return; // refused unread by proxy.ts, before any action runs
  expect(answer.status, answer.text.slice(0, 300)).toBe(200);
  expect(answer.text).toMatch(/"status":"error"/);
  const message = /"message":"((?:[^"\\]|\\.)*)"/.exec(answer.text)?.[1];
  expect(isReadable(message), answer.text.slice(0, 300)).toBe(true);
}

describe("the entering actions refuse malformed forms in words and write nothing", () => {
  it(`the entry form (${RUNS} forms)`, async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.record({
          carId: junkText,
          classId: junkText,
          lapTime: junkText,
          experience: junkText,
          coDriverEmail: junkText,
        }),
        fc.boolean(),
        async (fields, ownEvent) => {
          const answer = await callServerAction(who.session, {
            action: ENTER,
            page: `/events/${event.slug}/enter`,
            state: { status: "idle" },
            fields: { eventSlug: ownEvent ? event.slug : "no-such-event", ...fields },
          });
          expectRefusal(answer);
        },
      ),
      { numRuns: RUNS },
    );
  }, 300_000);

  it(`the co-driver invitation (${RUNS} forms)`, async () => {
    await fc.assert(
      fc.asyncProperty(fc.option(junkText, { nil: undefined }), junkText, async (id, email) => {
        const answer = await callServerAction(who.session, {
          action: INVITE,
          page: `/entries/${entryId}`,
          state: { status: "idle" },
          fields: { entryId: id ?? entryId, coDriverEmail: email },
        });
        expectRefusal(answer);
      }),
      { numRuns: RUNS },
    );
  }, 300_000);

  it(`accepting and declining an invitation (${RUNS} forms each)`, async () => {
    for (const action of [ACCEPT, DECLINE]) {
      await fc.assert(
        fc.asyncProperty(junkText, junkText, junkText, async (token, lapTime, experience) => {
          const answer = await callServerAction(who.session, {
            action,
            page: "/invites/x",
            state: { status: "idle" },
            fields: { token, lapTime, experience },
          });
          expectRefusal(answer);
        }),
        { numRuns: RUNS },
      );
    }
  }, 300_000);
});
