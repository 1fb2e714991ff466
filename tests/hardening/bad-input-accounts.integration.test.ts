// Bad input for the accounts actions (issue 11): generated malformed forms (fast-check) → the
// form's state in words, never a 5xx, and no row changed in any table (the sign-in limits'
// counters aside: they count by design).
import fc from "fast-check";
import { afterEach, beforeAll, beforeEach, describe, expect, inject, it } from "vitest";
import { callServerAction } from "../support/call-server-action";
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
  if (answer.status === 413) return; // refused unread by proxy.ts, in words (bad-input.integration)
  expect(answer.status, answer.text.slice(0, 300)).toBe(200);
  // Words: the form's message, or a message beside each field that was wrong.
  const message =
    /"message":"((?:[^"\\]|\\.)*)"/.exec(answer.text)?.[1] ??
    /"fields":\{"\w+":\["((?:[^"\\]|\\.)*)"/.exec(answer.text)?.[1];
  expect(isReadable(message), answer.text.slice(0, 300)).toBe(true);
}

const cases: [string, string, () => fc.Arbitrary<Record<string, string>>, () => HttpSession][] = [
  [
    "app/(auth)/sign-up/actions.ts#signUpWithPassword",
    "/sign-up",
    // Junk in the address, always: a plausible address with a plausible name and password would
    // rightly make an account.
    () =>
      fc.record({
        email: junkText.filter((v) => !/@.+\./.test(v)),
        fullName: junkText,
        password: junkText,
      }),
    () => new HttpSession(appUrl),
  ],
  [
    "app/(auth)/sign-up/actions.ts#signUpWithEmailLink",
    "/sign-up",
    () => fc.record({ email: junkText.filter((v) => !/@.+\./.test(v)), fullName: junkText }),
    () => new HttpSession(appUrl),
  ],
  [
    "app/(signed-in)/profile/actions.ts#saveProfile",
    "/profile",
    // Junk in the date of birth, always: a whole valid profile would rightly be saved.
    () =>
      fc.record({
        fullName: junkText,
        dateOfBirth: junkText.filter((v) => !/^\d{4}-\d{2}-\d{2}$/.test(v.trim())),
        phone: junkText,
        emergencyContactName: junkText,
        emergencyContactPhone: junkText,
        licence: junkText,
        experienceLevel: junkText,
      }),
    () => entrant,
  ],
];

describe("accounts actions refuse malformed forms in words", () => {
  for (const [action, page, fields, session] of cases) {
    it(action, async () => {
      await fc.assert(
        fc.asyncProperty(fields(), async (form) => {
          await expectRefusal(
            await callServerAction(session(), { action, page, fields: form, state: {} }),
          );
        }),
        { numRuns: RUNS },
      );
    }, 180_000);
  }
});
