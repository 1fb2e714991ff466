// Bad input: for every write route and server action, 1,000 generated malformed inputs (wrong
// types, huge and unicode strings, NaN and negative numbers, missing and extra fields, deep
// nesting, oversized bodies, wrong content types) → a refusal a person can read (4xx, or for a
// sync batch each record refused with words; for a form, an error state), never a 5xx, and no
// row changed in any table (every table counted before and after).
// Inputs come from fast-check (npm); each is checked malformed against the app's own schema
// before it is sent, so a valid input that happens to be generated is never sent.
import fc from "fast-check";
import { v7 as uuidv7 } from "uuid";
import { afterEach, beforeAll, beforeEach, describe, expect, inject, it } from "vitest";
import { emailSignInSchema, passwordSignInSchema } from "@/lib/auth/sign-in-schema";
import { carInputSchema } from "@/lib/cars/car-schema";
import { incomingRecordSchema } from "@/lib/scrutineer/records/record-schema";
import { syncRequestSchema } from "@/lib/tech/sync-schema";
import { callServerAction, listServerActions } from "../support/call-server-action";
import { countAllRows } from "../support/count-all-rows";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { isReadable, junkBody, junkValue, mutate } from "../support/malformed";
import { readingRecord, techFixtures } from "../support/tech-fixtures";

/** What the server will see: the value after a JSON round trip (undefined fields vanish). */
const onTheWire = (value: unknown): unknown => {
  const text = JSON.stringify(value);
  return text === undefined ? undefined : JSON.parse(text);
};

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const RUNS = 1_000;
/** Tables that count attempts on purpose (the sign-in limiter), not data a request may change. */
const COUNTERS = ["rate_limits", "sign_in_limits"];

let fx: Awaited<ReturnType<typeof techFixtures>>;
let sam: HttpSession;
let entrant: HttpSession;
let organizer: HttpSession;
let samId: string;
let rowsBefore: Record<string, number>;

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  sam = new HttpSession(appUrl);
  await sam.signInWithPassword(demo.scrutineer, demo.password);
  entrant = new HttpSession(appUrl);
  await entrant.signInWithPassword(demo.entrant, demo.password);
  organizer = new HttpSession(appUrl);
  await organizer.signInWithPassword(demo.organizer, demo.password);
  samId = await fx.userId(demo.scrutineer);
});
beforeEach(async () => {
  rowsBefore = await countAllRows(databaseUrl, COUNTERS);
});
afterEach(async () => {
  expect(await countAllRows(databaseUrl, COUNTERS)).toEqual(rowsBefore);
});

/** A refused request: 4xx with a readable message in our error envelope. */
async function expectRefusal(response: Response) {
  const text = await response.text();
  expect(response.status, text.slice(0, 300)).toBeGreaterThanOrEqual(400);
  expect(response.status, text.slice(0, 300)).toBeLessThan(500);
  const body = JSON.parse(text) as { error?: { message?: string } };
  expect(isReadable(body.error?.message), text.slice(0, 300)).toBe(true);
}

const sendJson = (session: HttpSession, url: string, body: string, type = "application/json") =>
  session.fetch(url, { method: "POST", headers: { "content-type": type }, body });

describe("POST /api/cars", () => {
  const car = { make: "Mazda", model: "MX-5", year: 1999, colour: "Blue", notes: "" };
  const malformed = fc
    .oneof(mutate(car, Object.keys(car)), junkValue)
    .filter((v) => !carInputSchema.safeParse(onTheWire(v)).success);

  it(`refuses ${RUNS} malformed cars with a readable 4xx and adds none`, async () => {
    await fc.assert(
      fc.asyncProperty(malformed, async (input) => {
        await expectRefusal(await sendJson(entrant, "/api/cars", JSON.stringify(input)));
      }),
      { numRuns: RUNS },
    );
  }, 240_000);

  it("refuses bodies that are not JSON, or not sent as JSON", async () => {
    await fc.assert(
      fc.asyncProperty(
        junkBody,
        fc.constantFrom("application/json", "text/plain", "application/x-www-form-urlencoded"),
        async (body, type) => {
          await expectRefusal(await sendJson(entrant, "/api/cars", body, type));
        },
      ),
      { numRuns: 200 },
    );
  }, 120_000);
});

describe("POST /api/events/[eventId]/sync", () => {
  const url = () => `/api/events/${fx.eventId}/sync`;
  const record = () =>
    readingRecord({
      entryId: fx.eventId, // replaced below with a real entry
      officialId: "x",
      deviceId: "phone-fuzz",
      dimension: "wingChordMm",
      valueMm: 250,
    });
  let base: Record<string, unknown>;
  beforeAll(async () => {
    base = { ...record(), entryId: await fx.entryByNumber(9), officialId: samId };
  });
  const recordPaths = [
    "id",
    "kind",
    "entryId",
    "officialId",
    "deviceId",
    "deviceTime",
    "payload",
    "payload.dimension",
    "payload.value",
    "payload.instrument",
    "payload.instrument.id",
    "payload.instrument.name",
    "payload.instrument.standardUncertainty",
    "payload.conditions",
  ];

  it(`refuses ${RUNS} malformed records one by one, in words, and stores none`, async () => {
    const badRecord = fc
      .constant(null)
      .chain(() => fc.oneof(mutate({ ...base, id: uuidv7() }, recordPaths), junkValue))
      .filter((r) => !incomingRecordSchema.safeParse(onTheWire(r)).success);
    await fc.assert(
      fc.asyncProperty(fc.array(badRecord, { minLength: 1, maxLength: 3 }), async (records) => {
        const response = await sendJson(sam, url(), JSON.stringify({ deviceId: "p", records }));
        const text = await response.text();
        expect(response.status, text.slice(0, 300)).toBe(200);
        const body = JSON.parse(text) as { results: { status: string; reason?: string }[] };
        for (const result of body.results) {
          expect(result.status).toBe("refused");
          expect(isReadable(result.reason), result.reason).toBe(true);
        }
      }),
      { numRuns: RUNS },
    );
  }, 240_000);

  it("refuses malformed batches (and bodies that are not JSON) with a readable 4xx", async () => {
    const batch = { deviceId: "phone-fuzz", records: [base] };
    const badBatch = fc
      .oneof(mutate(batch, ["deviceId", "records"]), junkValue)
      .filter((b) => !syncRequestSchema.safeParse(onTheWire(b)).success)
      .map((b) => JSON.stringify(b));
    await fc.assert(
      fc.asyncProperty(fc.oneof(badBatch, junkBody), async (body) => {
        await expectRefusal(await sendJson(sam, url(), body));
      }),
      { numRuns: 300 },
    );
  }, 120_000);
});

describe("POST /api/events/[eventId]/uploads", () => {
  it(`refuses ${RUNS} malformed photo forms with a readable 4xx and stores none`, async () => {
    const field = fc.option(
      junkValue.map((v) => (typeof v === "string" ? v : (JSON.stringify(v) ?? ""))),
      { nil: undefined },
    );
    const file = fc.option(fc.uint8Array({ maxLength: 2_000 }), { nil: undefined });
    await fc.assert(
      fc.asyncProperty(field, field, field, file, async (recordId, entryId, storageKey, bytes) => {
        const form = new FormData();
        if (recordId !== undefined) form.set("recordId", recordId);
        if (entryId !== undefined) form.set("entryId", entryId);
        if (storageKey !== undefined) form.set("storageKey", storageKey);
        if (bytes !== undefined) form.set("file", new Blob([new Uint8Array(bytes)]), "x.jpg");
        await expectRefusal(
          await sam.fetch(`/api/events/${fx.eventId}/uploads`, { method: "POST", body: form }),
        );
      }),
      { numRuns: RUNS },
    );
  }, 240_000);
});

describe("Auth.js's own POST endpoints", () => {
  // Each try from its own documentation address (RFC 5737 TEST-NET-3), so the per-network
  // sign-in limit never blocks the demo accounts other tests sign in with.
  let n = 0;
  const address = () => {
    n += 1;
    return `203.0.113.${n % 250}`;
  };

  // Half the tries carry a real CSRF token (with its cookie), so the junk reaches Auth.js's own
  // handling of the address and password, not only its CSRF check.
  let csrfSession: HttpSession;
  let csrfToken = "";
  beforeAll(async () => {
    csrfSession = new HttpSession(appUrl);
    const answer = await csrfSession.fetch("/api/auth/csrf");
    csrfToken = ((await answer.json()) as { csrfToken: string }).csrfToken;
  });

  it(`answers ${RUNS} malformed sign-in posts without a 5xx and signs in nobody`, async () => {
    const field = fc.option(junkText, { nil: undefined });
    const notAnAddress = fc.option(
      junkText.filter((email) => !emailSignInSchema.safeParse({ email }).success),
      { nil: undefined },
    );
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom("/api/auth/callback/credentials", "/api/auth/signin/nodemailer"),
        notAnAddress,
        field,
        fc.oneof(fc.constant("valid"), field),
        fc.constantFrom("application/x-www-form-urlencoded", "application/json", "text/plain"),
        async (path, email, password, csrf, type) => {
          const fields: Record<string, string> = {};
          if (email !== undefined) fields.email = email;
          if (password !== undefined) fields.password = password;
          if (csrf === "valid") fields.csrfToken = csrfToken;
          else if (csrf !== undefined) fields.csrfToken = csrf;
          const body = type.includes("json")
            ? JSON.stringify(fields)
            : new URLSearchParams(fields).toString();
          const session = csrf === "valid" ? csrfSession : new HttpSession(appUrl);
          const response = await session.fetch(path, {
            method: "POST",
            headers: { "content-type": type, "x-forwarded-for": address() },
            body,
          });
          expect(response.status, await response.text()).toBeLessThan(500);
          expect(session.hasCookie("authjs.session-token")).toBe(false);
        },
      ),
      { numRuns: RUNS },
    );
  }, 300_000);
});

describe("raw posts to pages (server actions with or without the Next-Action header)", () => {
  // What a hand-made client can send where Next runs server actions: any body, any type, with
  // or without an action id, broken or oversized. Source of the framing rules: RFC 7578 and
  // RFC 2046 §5.1.1 (multipart/form-data, the close delimiter).
  const bodies = fc.oneof(
    junkBody,
    fc.constantFrom(
      '--x\r\nContent-Disposition: form-data; name="a"\r\n\r\nv',
      '--x\r\nContent-Disposition: form-data; name="\u0000"\r\n\r\nv\r\n--x--\r\n',
      "--x--\r\n",
      "",
    ),
    fc.integer({ min: 65 * 1024, max: 300 * 1024 }).map((n) => "a".repeat(n)),
  );
  it(`answers ${RUNS} raw posts to the sign-in page without a 5xx`, async () => {
    const actionId = [...listServerActions().entries()].find(([name]) =>
      name.endsWith("#signInWithPassword"),
    )?.[1];
    await fc.assert(
      fc.asyncProperty(
        bodies,
        fc.constantFrom(
          "multipart/form-data; boundary=x",
          "multipart/form-data",
          "application/x-www-form-urlencoded",
          "text/plain;charset=UTF-8",
          "application/json",
        ),
        fc.constantFrom(actionId ?? "", "0000", undefined),
        async (body, type, action) => {
          const headers: Record<string, string> = { "content-type": type };
          if (action !== undefined) headers["next-action"] = action;
          const response = await new HttpSession(appUrl).fetch("/sign-in", {
            method: "POST",
            headers,
            body,
          });
          expect(response.status, (await response.text()).slice(0, 200)).toBeLessThan(500);
        },
      ),
      { numRuns: RUNS },
    );
  }, 300_000);
});

/** The answer of a server action to junk: an error state in words, never a 5xx. */
async function expectActionRefusal(answer: { status: number; text: string }) {
  expect(answer.status, answer.text.slice(0, 300)).toBe(200);
  expect(answer.text).toMatch(/"status":"error"|"message":"/);
  const message = /"message":"((?:[^"\\]|\\.)*)"/.exec(answer.text)?.[1];
  expect(isReadable(message), answer.text.slice(0, 300)).toBe(true);
}

const junkText = junkValue.map((v) => (typeof v === "string" ? v : (JSON.stringify(v) ?? "")));

describe("server actions", () => {
  it(`the class-rules draft refuses ${RUNS} malformed forms and saves nothing`, async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.option(junkText, { nil: undefined }),
        fc.constantFrom("check", "save", "", "delete"),
        junkText,
        junkText,
        async (eventId, intent, text, notes) => {
          const answer = await callServerAction(organizer, {
            action: "app/(officials)/organizer/[eventId]/rules/actions.ts#draftRuleSetAction",
            page: `/organizer/${fx.eventId}/rules`,
            fields: { eventId: eventId ?? fx.eventId, intent, text, notes },
            state: { status: "idle", issues: [] },
          });
          await expectActionRefusal(answer);
        },
      ),
      { numRuns: RUNS },
    );
  }, 300_000);

  it(`pinning refuses ${RUNS} malformed forms and pins nothing`, async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.option(junkText, { nil: undefined }),
        junkText,
        fc.oneof(fc.constant("yes"), junkText),
        async (eventId, versionId, confirm) => {
          const answer = await callServerAction(organizer, {
            action: "app/(officials)/organizer/[eventId]/rules/actions.ts#pinRuleSetAction",
            page: `/organizer/${fx.eventId}/rules`,
            fields: { eventId: eventId ?? fx.eventId, versionId, confirm },
            state: { status: "idle" },
          });
          await expectActionRefusal(answer);
        },
      ),
      { numRuns: RUNS },
    );
  }, 300_000);

  it(`revoking a pass refuses ${RUNS} malformed forms and revokes nothing`, async () => {
    await fc.assert(
      fc.asyncProperty(junkText, junkText, async (token, reason) => {
        const answer = await callServerAction(organizer, {
          action: "app/p/[token]/actions.ts#revokePassAction",
          page: "/p/x",
          fields: { token, reason },
          state: { status: "idle" },
        });
        await expectActionRefusal(answer);
      }),
      { numRuns: RUNS },
    );
  }, 300_000);

  it(`password sign-in refuses ${RUNS} malformed forms in words`, async () => {
    const form = fc
      .record({ email: junkText, password: junkText })
      .filter((f) => !passwordSignInSchema.safeParse(f).success);
    await fc.assert(
      fc.asyncProperty(form, async (fields) => {
        const answer = await callServerAction(new HttpSession(appUrl), {
          action: "app/(auth)/sign-in/actions.ts#signInWithPassword",
          page: "/sign-in",
          fields,
          state: {},
        });
        expect(answer.status, answer.text.slice(0, 300)).toBe(200);
        expect(answer.text).toMatch(/"fields":|"message":"/);
      }),
      { numRuns: RUNS },
    );
  }, 300_000);

  it(`the sign-in link refuses ${RUNS} malformed addresses in words and sends nothing`, async () => {
    const form = fc
      .record({ email: junkText })
      .filter((f) => !emailSignInSchema.safeParse(f).success);
    await fc.assert(
      fc.asyncProperty(form, async (fields) => {
        const answer = await callServerAction(new HttpSession(appUrl), {
          action: "app/(auth)/sign-in/actions.ts#signInWithEmailLink",
          page: "/sign-in",
          fields,
          state: {},
        });
        expect(answer.status, answer.text.slice(0, 300)).toBe(200);
        expect(answer.text).toMatch(/"fields":|"message":"/);
      }),
      { numRuns: RUNS },
    );
  }, 300_000);

  it(`signing out takes ${RUNS} junk forms from a signed-out browser without an error`, async () => {
    await fc.assert(
      fc.asyncProperty(junkText, junkText, async (name, value) => {
        const answer = await callServerAction(new HttpSession(appUrl), {
          action: "app/sign-out-action.ts#signOutAction",
          page: "/",
          fields: { [name.slice(0, 50) || "x"]: value },
        });
        expect(answer.status, answer.text.slice(0, 200)).toBeLessThan(500);
      }),
      { numRuns: RUNS },
    );
  }, 300_000);
});
