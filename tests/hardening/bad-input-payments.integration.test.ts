// Malformed input to the payments edges: the pay and withdraw actions refuse junk forms in words
// and write nothing; the webhook refuses junk bodies and headers with 400 (413 over its limit)
// and writes nothing. Source for the webhook: https://docs.stripe.com/webhooks#verify-manually
// (an unverifiable delivery is refused; the endpoint answers 2xx only to what it accepted).
import fc from "fast-check";
import { afterEach, beforeAll, beforeEach, describe, expect, inject, it } from "vitest";
import { callServerAction } from "../support/call-server-action";
import { PAY_ACTION, WITHDRAW_ACTION } from "../support/checkout-through-fake";
import { countAllRows } from "../support/count-all-rows";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { isReadable, junkValue } from "../support/malformed";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const RUNS = 150;
const COUNTERS = ["rate_limits", "sign_in_limits"];

let entrant: HttpSession;
let rowsBefore: Record<string, number>;

beforeAll(async () => {
  entrant = new HttpSession(appUrl);
  await entrant.signInWithPassword(demo.entrant, demo.password);
});
beforeEach(async () => {
  rowsBefore = await countAllRows(databaseUrl, COUNTERS);
});
afterEach(async () => {
  expect(await countAllRows(databaseUrl, COUNTERS)).toEqual(rowsBefore);
});

const junkText = junkValue.map((v) => (typeof v === "string" ? v : (JSON.stringify(v) ?? "")));

async function expectRefusal(answer: { status: number; text: string }) {
  if (answer.status === 413) return;
  expect(answer.status, answer.text.slice(0, 300)).toBe(200);
  expect(answer.text).toMatch(/"status":"error"/);
  const message = /"message":"((?:[^"\\]|\\.)*)"/.exec(answer.text)?.[1];
  expect(isReadable(message), answer.text.slice(0, 300)).toBe(true);
}

describe("the pay and withdraw actions", () => {
  it.each([
    ["pay", PAY_ACTION, "pay"],
    ["withdraw", WITHDRAW_ACTION, "withdraw"],
  ])(
    `%s refuses ${RUNS} malformed forms in words and writes nothing`,
    async (_name, action, page) => {
      await fc.assert(
        fc.asyncProperty(junkText, junkText, async (entryId, confirm) => {
          const answer = await callServerAction(entrant, {
            action,
            page: `/entries/00000000-0000-4000-8000-000000000000/${page}`,
            fields: { entryId, confirm },
            state: { status: "idle" },
          });
          await expectRefusal(answer);
        }),
        { numRuns: RUNS },
      );
    },
    300_000,
  );

  it("an entry that does not exist is refused in words", async () => {
    for (const action of [PAY_ACTION, WITHDRAW_ACTION]) {
      const answer = await callServerAction(entrant, {
        action,
        page: `/entries/00000000-0000-4000-8000-000000000000/${action === PAY_ACTION ? "pay" : "withdraw"}`,
        fields: { entryId: "00000000-0000-4000-8000-000000000000", confirm: "yes" },
        state: { status: "idle" },
      });
      await expectRefusal(answer);
      expect(answer.text, action).toContain("No such entry.");
    }
  });
});

describe("the payments webhook", () => {
  it(`refuses ${RUNS} junk deliveries with 400 and writes nothing`, async () => {
    await fc.assert(
      fc.asyncProperty(junkText, fc.option(junkText, { nil: undefined }), async (body, sig) => {
        const headers: Record<string, string> = { "content-type": "application/json" };
        // Header values must be ByteStrings; junk that is not one cannot be sent at all.
        if (sig !== undefined && /^[\x20-\x7e]*$/.test(sig)) headers["stripe-signature"] = sig;
        const res = await fetch(`${appUrl}/api/payments/webhook`, {
          method: "POST",
          headers,
          body,
        });
        // 431: a header over Node's 16 KB limit is refused by the HTTP server before the app.
        expect([400, 413, 431]).toContain(res.status);
        await res.arrayBuffer();
      }),
      { numRuns: RUNS },
    );
  }, 300_000);

  it("refuses a body over its limit with 413, unread", async () => {
    const res = await fetch(`${appUrl}/api/payments/webhook`, {
      method: "POST",
      headers: { "content-type": "application/json", "stripe-signature": "t=1,v1=00" },
      body: "x".repeat(70 * 1024),
    });
    expect(res.status).toBe(413);
  });
});
