// Bad input for the clerk of course's and the chief scrutineer's run-sheet actions: generated
// malformed forms (fast-check) → an error state in words, never a 5xx, and no row changed in any
// table. The same contract as bad-input.integration.test.ts, for the actions issue 10 added.
import fc from "fast-check";
import { afterEach, beforeAll, beforeEach, describe, expect, inject, it } from "vitest";
import { callServerAction } from "../support/call-server-action";
import { countAllRows } from "../support/count-all-rows";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { isReadable, junkValue } from "../support/malformed";
import { techFixtures } from "../support/tech-fixtures";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const RUNS = 400;
const COUNTERS = ["rate_limits", "sign_in_limits"];
const CLERK = "app/(officials)/clerk/[eventId]/actions.ts";

let fx: Awaited<ReturnType<typeof techFixtures>>;
let clerk: HttpSession;
let chief: HttpSession;
let rowsBefore: Record<string, number>;

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  clerk = new HttpSession(appUrl);
  await clerk.signInWithPassword(demo.clerk, demo.password);
  chief = new HttpSession(appUrl);
  await chief.signInWithPassword(demo.chief, demo.password);
});
beforeEach(async () => {
  rowsBefore = await countAllRows(databaseUrl, COUNTERS);
});
afterEach(async () => {
  expect(await countAllRows(databaseUrl, COUNTERS)).toEqual(rowsBefore);
});

const junkText = junkValue.map((v) => (typeof v === "string" ? v : (JSON.stringify(v) ?? "")));
/** JSON that is almost right: the right shape with junk in its places, or junk. */
const junkJson = fc.oneof(
  junkText,
  fc
    .array(fc.record({ name: junkValue, driveIds: junkValue }), { maxLength: 3 })
    .map((v) => JSON.stringify(v)),
  fc
    .record({ dayStart: junkValue, sessionMinutes: junkValue, rounds: junkValue })
    .map((v) => JSON.stringify(v)),
);

async function expectRefusal(answer: { status: number; text: string }) {
  // A form over the page's body limit is refused before it is read (proxy.ts), in words.
  if (answer.status === 413) {
    const message = /"message":"((?:[^"\\]|\\.)*)"/.exec(answer.text)?.[1] ?? answer.text;
    expect(isReadable(message), answer.text.slice(0, 300)).toBe(true);
    return;
  }
  expect(answer.status, answer.text.slice(0, 300)).toBe(200);
  expect(answer.text).toMatch(/"status":"error"/);
  const message = /"message":"((?:[^"\\]|\\.)*)"/.exec(answer.text)?.[1];
  expect(isReadable(message), answer.text.slice(0, 300)).toBe(true);
}

const cases: [string, string[], () => fc.Arbitrary<Record<string, string>>][] = [
  [
    "buildRunGroupsAction",
    ["settings", "revision"],
    () => fc.record({ settings: junkJson, revision: junkText }),
  ],
  [
    "saveRunGroupsAction",
    ["groups", "settings", "revision"],
    () => fc.record({ groups: junkJson, settings: junkJson, revision: junkText }),
  ],
  ["publishRunSheetAction", ["revision"], () => fc.record({ revision: junkText })],
  [
    "callSessionAction",
    ["sessionKey", "state", "note"],
    () => fc.record({ sessionKey: junkText, state: junkText, note: junkText }),
  ],
  [
    "askReinspectionAction",
    ["entryId", "cause", "askedBy", "reason"],
    () => fc.record({ entryId: junkText, cause: junkText, askedBy: junkText, reason: junkText }),
  ],
];

describe("the clerk of course's actions", () => {
  it.each(cases)(
    `%s refuses ${RUNS} malformed forms in words and writes nothing`,
    async (name, _f, arb) => {
      await fc.assert(
        fc.asyncProperty(
          arb(),
          fc.option(junkText, { nil: undefined }),
          async (fields, eventId) => {
            const answer = await callServerAction(clerk, {
              action: `${CLERK}#${name}`,
              page: `/clerk/${fx.eventId}`,
              fields: { eventId: eventId ?? fx.eventId, ...fields },
              state: { status: "idle" },
            });
            await expectRefusal(answer);
          },
        ),
        { numRuns: RUNS },
      );
    },
    300_000,
  );
});

describe("the chief scrutineer's re-inspection", () => {
  it(`closing refuses ${RUNS} malformed forms in words and closes nothing`, async () => {
    await fc.assert(
      fc.asyncProperty(junkText, junkText, async (reinspectionId, note) => {
        const answer = await callServerAction(chief, {
          action: "app/(officials)/tech/[eventId]/chief/actions.ts#closeReinspectionAction",
          page: `/tech/${fx.eventId}/chief`,
          fields: { eventId: fx.eventId, reinspectionId, note },
          state: { status: "idle" },
        });
        await expectRefusal(answer);
      }),
      { numRuns: RUNS },
    );
  }, 300_000);
});
