// Bad input for the pre-check's save and delete actions: generated malformed forms (fast-check)
// → an error state in words, never a 5xx, and no row changed in any table.
import fc from "fast-check";
import { afterEach, beforeAll, beforeEach, describe, expect, inject, it } from "vitest";
import { saveAeroPlanInputSchema } from "@/lib/precheck/save-aero-plan-input-schema";
import { callServerAction } from "../support/call-server-action";
import { countAllRows } from "../support/count-all-rows";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { isReadable, junkValue, mutate } from "../support/malformed";
import { queryTestDb } from "../support/query-test-db";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const RUNS = 300;
const COUNTERS = ["rate_limits", "sign_in_limits"];
const ACTIONS = "app/pre-check/actions.ts";

let owner: HttpSession;
let ownCarId: string;
let rowsBefore: Record<string, number>;

const inch = (value: number) => ({ value, unit: "in" });
const plan = {
  car: { bodyWidth: inch(64), roofHeight: inch(52), rearmostBodywork: inch(36) },
  wing: {
    span: { kind: "parts", half: inch(32) },
    endPlate: inch(0.25),
    chord: inch(10),
    height: inch(58),
    mount: { distance: inch(3), direction: "behind" },
  },
};
const junkText = junkValue.map((v) => (typeof v === "string" ? v : (JSON.stringify(v) ?? "")));
/** A plan with one part replaced by junk (or taken out), or junk for the whole plan. */
const junkPlan = fc.oneof(
  junkText,
  mutate(plan, ["car", "wing"]).map((v) => JSON.stringify(v) ?? ""),
  mutate(plan.wing, ["span", "endPlate", "chord", "height", "mount"]).map(
    (wing) => JSON.stringify({ ...plan, wing }) ?? "",
  ),
  mutate(plan.car, ["bodyWidth", "roofHeight", "rearmostBodywork"]).map(
    (car) => JSON.stringify({ ...plan, car }) ?? "",
  ),
);

beforeAll(async () => {
  const [own] = await queryTestDb<{ id: string }>(
    databaseUrl,
    `select c.id from cars c join users u on u.id = c.owner_id
      where u.email = ? and c.retired_at is null order by c.id limit 1`,
    [demo.entrant],
  );
  if (!own) throw new Error("no car");
  ownCarId = own.id;
  owner = new HttpSession(appUrl);
  await owner.signInWithPassword(demo.entrant, demo.password);
});
beforeEach(async () => {
  rowsBefore = await countAllRows(databaseUrl, COUNTERS);
});
afterEach(async () => {
  expect(await countAllRows(databaseUrl, COUNTERS)).toEqual(rowsBefore);
});

async function expectRefusal(answer: { status: number; text: string }) {
  if (answer.status === 413 || answer.status === 400) {
    const message = /"message":"((?:[^"\\]|\\.)*)"/.exec(answer.text)?.[1] ?? answer.text;
    expect(isReadable(message), answer.text.slice(0, 300)).toBe(true);
    return;
  }
  expect(answer.status, answer.text.slice(0, 300)).toBe(200);
  expect(answer.text).toMatch(/"status":"error"/);
  const message = /"message":"((?:[^"\\]|\\.)*)"/.exec(answer.text)?.[1];
  expect(isReadable(message), answer.text.slice(0, 300)).toBe(true);
}

describe("the pre-check's actions", () => {
  it(`saving refuses ${RUNS} malformed forms in words and saves nothing`, async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.option(junkText, { nil: undefined }),
        fc.option(
          junkText.filter((n) => n.trim() === "" || n.length > 80),
          { nil: undefined },
        ),
        junkPlan,
        async (carId, name, planText) => {
          const fields = {
            carId: carId ?? ownCarId,
            name: name ?? "precheck bad input",
            plan: planText,
          };
          // Only forms with something wrong: a mutation that still reads as a plan (an unknown
          // key is dropped) would rightly be saved.
          fc.pre(!saveAeroPlanInputSchema.safeParse(fields).success);
          const answer = await callServerAction(owner, {
            action: `${ACTIONS}#saveAeroPlanAction`,
            page: "/pre-check",
            fields,
            state: { status: "idle" },
          });
          await expectRefusal(answer);
        },
      ),
      { numRuns: RUNS },
    );
  }, 300_000);

  it(`deleting refuses ${RUNS} malformed ids in words and deletes nothing`, async () => {
    await fc.assert(
      fc.asyncProperty(junkText, async (planId) => {
        const answer = await callServerAction(owner, {
          action: `${ACTIONS}#deleteAeroPlanAction`,
          page: "/pre-check",
          fields: { planId },
          state: { status: "idle" },
        });
        await expectRefusal(answer);
      }),
      { numRuns: RUNS },
    );
  }, 300_000);
});
