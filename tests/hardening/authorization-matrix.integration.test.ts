// The authorization matrix: every route handler and every server action in app/ (found by
// reading the folder, so a new one without a row fails the first test) × signed out, the entry's
// own entrant, another entrant, each official role, and an official of another event → the
// status each must get. Writes are sent with a body that is refused after the guard (422), or
// one that changes nothing, so allowed callers show the guard let them through.
import { randomUUID } from "node:crypto";
import { v7 as uuidv7 } from "uuid";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { signPass } from "@/lib/passes/sign-pass";
import { actionOutcome, callServerAction, listServerActions } from "../support/call-server-action";
import type { HttpSession } from "../support/http-session";
import {
  listPrintPages,
  listRouteHandlers,
  listServerActionSources,
} from "../support/list-app-endpoints";
import {
  type CallerName,
  callerNames,
  matrixCallers,
  removeOutsider,
} from "../support/matrix-callers";
import { queryTestDb } from "../support/query-test-db";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type Expect = Record<CallerName, number>;
type Ctx = { eventId: string; entryId: string; versionId: string; passToken: string };

/** Everyone gets `status`. */
const all = (status: number): Expect =>
  Object.fromEntries(callerNames.map((c) => [c, status])) as Expect;
/** Signed-out 401; the named callers `ok`; everyone else 403. */
const only = (ok: number, ...allowed: CallerName[]): Expect =>
  Object.fromEntries(
    callerNames.map((c) => [c, c === "anonymous" ? 401 : allowed.includes(c) ? ok : 403]),
  ) as Expect;
const officials: CallerName[] = ["scrutineer", "chief", "clerk", "registrar", "organizer"];
const techReaders: CallerName[] = ["scrutineer", "chief", "clerk", "organizer"];
const writers: CallerName[] = ["scrutineer", "chief"];
const signedIn = (ok: number): Expect => ({ ...all(ok), anonymous: 401 });

const json = (body: unknown): RequestInit => ({
  method: "POST",
  headers: { "content-type": "application/json" },
  body: JSON.stringify(body),
});

type Row = {
  expect: Expect;
  call: (s: HttpSession, c: Ctx) => Promise<number>;
};
const get = (url: (c: Ctx) => string) => async (s: HttpSession, c: Ctx) =>
  (await s.fetch(url(c))).status;
const post = (url: (c: Ctx) => string, init: () => RequestInit) => async (s: HttpSession, c: Ctx) =>
  (await s.fetch(url(c), init())).status;
const action =
  (
    name: string,
    page: (c: Ctx) => string,
    fields: (c: Ctx) => Record<string, string>,
    state?: unknown,
  ) =>
  async (s: HttpSession, c: Ctx) =>
    actionOutcome(
      await callServerAction(s, { action: name, page: page(c), fields: fields(c), state }),
    );

/** The car of the context's entry (garage & pass rows). */
async function carOf(c: Ctx): Promise<string> {
  const [row] = await queryTestDb<{ car_id: string }>(
    databaseUrl,
    "select car_id from entries where id = ?",
    [c.entryId],
  );
  if (!row) throw new Error("no car for the entry");
  return row.car_id;
}

const routes: Record<string, Row> = {
  "GET /api/auth/[...nextauth]": { expect: all(200), call: get(() => "/api/auth/providers") },
  "POST /api/auth/[...nextauth]": {
    // No CSRF token: Auth.js refuses and sends the browser back to sign-in, whoever asks.
    expect: all(302),
    call: post(
      () => "/api/auth/signout",
      () => ({
        method: "POST",
        headers: { "content-type": "application/x-www-form-urlencoded" },
        body: "",
      }),
    ),
  },
  "GET /api/cars": { expect: signedIn(200), call: get(() => "/api/cars") },
  "POST /api/cars": {
    expect: signedIn(422),
    call: post(
      () => "/api/cars",
      () => json({}),
    ),
  },
  "GET /api/entries/[entryId]/verdict": {
    expect: { ...only(200, "owner", ...officials) },
    call: get((c) => `/api/entries/${c.entryId}/verdict`),
  },
  "GET /api/entries/[entryId]/calendar": {
    // Allowed callers get through to the run sheet, which has no publication in this database.
    expect: only(404, "owner", ...officials),
    call: get((c) => `/api/entries/${c.entryId}/calendar`),
  },
  "GET /api/events/[eventId]/run-groups": {
    expect: only(200, "clerk"),
    call: get((c) => `/api/events/${c.eventId}/run-groups`),
  },
  "GET /api/events/[eventId]/board": {
    expect: all(200),
    call: get((c) => `/api/events/${c.eventId}/board`),
  },
  "GET /api/events/[eventId]/entries": {
    expect: only(200, ...officials),
    call: get((c) => `/api/events/${c.eventId}/entries`),
  },
  "GET /api/events/[eventId]/pack": {
    expect: only(200, ...techReaders),
    call: get((c) => `/api/events/${c.eventId}/pack`),
  },
  "GET /api/events/[eventId]/photos/[recordId]": {
    // Allowed callers reach the store, which has no such photo.
    expect: only(404, ...techReaders),
    call: get((c) => `/api/events/${c.eventId}/photos/${randomUUID()}?entry=${c.entryId}`),
  },
  "GET /api/events/[eventId]/registration/csv": {
    expect: only(200, "registrar"),
    call: get((c) => `/api/events/${c.eventId}/registration/csv`),
  },
  "GET /api/events/[eventId]/rule-sets/[versionId]": {
    expect: only(200, ...officials),
    call: get((c) => `/api/events/${c.eventId}/rule-sets/${c.versionId}`),
  },
  "POST /api/events/[eventId]/sync": {
    expect: only(422, ...writers),
    call: post(
      (c) => `/api/events/${c.eventId}/sync`,
      () => json({ deviceId: "m", records: [] }),
    ),
  },
  "POST /api/events/[eventId]/uploads": {
    expect: only(422, ...writers),
    call: post(
      (c) => `/api/events/${c.eventId}/uploads`,
      () => ({ method: "POST", body: new FormData() }),
    ),
  },
  "GET /api/health": { expect: all(200), call: get(() => "/api/health") },
  // ── payments (issue 11) ──
  // Public: the payments service has no session; the signature is the guard, so an unsigned
  // delivery is 400 for everyone and changes nothing.
  "POST /api/payments/webhook": {
    expect: all(400),
    call: post(
      () => "/api/payments/webhook",
      () => json({ id: "evt_matrix", type: "checkout.session.completed" }),
    ),
  },
  // ── end payments ──
  // Exports (issue 10): the tech results for every official; the chief scrutineer's report for
  // the chief scrutineer and the clerk of course (Motorsport UK NCR 2026 Ch.5 Part A App.6 Art.3.1).
  "GET /api/events/[eventId]/tech-results/csv": {
    expect: only(200, ...officials),
    call: get((c) => `/api/events/${c.eventId}/tech-results/csv`),
  },
  "GET /api/events/[eventId]/chief-report/csv": {
    expect: only(200, "chief", "clerk"),
    call: get((c) => `/api/events/${c.eventId}/chief-report/csv`),
  },
  "GET /api/events/[eventId]/run-sheet/csv": {
    // Allowed callers get the latest run sheet, or 404 ("none published yet") when no test file
    // has published one: both mean the guard let them through.
    expect: only(200, ...officials),
    call: async (s, c) => {
      const status = (await s.fetch(`/api/events/${c.eventId}/run-sheet/csv`)).status;
      return status === 404 ? 200 : status;
    },
  },
  // ── accounts (issue 11) ──
  "GET /sign-up/confirm": {
    // Public: the link's token is the proof. A token that is not live sends anyone to sign-in.
    expect: all(303),
    call: get(() => `/sign-up/confirm?token=${"0".repeat(64)}&email=nobody%40brackenmoor.test`),
  },
  // ── garage & pass (issue 11, part 4) ──
  // Car 7's car belongs to "owner": the owner is let through to the body check (422) or to the
  // store (no such file: 404); an official of its event sees its files; everyone else 403.
  "PATCH /api/cars/[carId]": {
    expect: only(422, "owner"),
    call: async (s, c) =>
      (
        await s.fetch(`/api/cars/${await carOf(c)}`, {
          ...json({}),
          method: "PATCH",
        })
      ).status,
  },
  "POST /api/cars/[carId]/retirement": {
    expect: only(422, "owner"),
    call: async (s, c) =>
      (await s.fetch(`/api/cars/${await carOf(c)}/retirement`, json({ retired: "maybe" }))).status,
  },
  "POST /api/cars/[carId]/files": {
    expect: only(422, "owner"),
    call: async (s, c) =>
      (await s.fetch(`/api/cars/${await carOf(c)}/files`, { method: "POST", body: new FormData() }))
        .status,
  },
  "GET /api/cars/[carId]/files/[fileId]": {
    expect: only(404, "owner", ...officials),
    call: async (s, c) =>
      (await s.fetch(`/api/cars/${await carOf(c)}/files/${randomUUID()}`)).status,
  },
  "GET /api/events/[eventId]/entries/[entryId]/car-files": {
    expect: only(200, ...officials),
    call: get((c) => `/api/events/${c.eventId}/entries/${c.entryId}/car-files`),
  },
  // ── end accounts ──
};

// A form on a signed-in page is never reached signed out: proxy.ts sends the browser to sign in.
const signedInPage = (expect: Expect): Expect => ({ ...expect, anonymous: 307 });

const clerkAction = (name: string, fields: (c: Ctx) => Record<string, string>): Row => ({
  expect: signedInPage(only(200, "clerk")),
  call: action(
    `app/(officials)/clerk/[eventId]/actions.ts#${name}`,
    (c) => `/clerk/${c.eventId}`,
    fields,
    {
      status: "idle",
    },
  ),
});
const settingsJson = JSON.stringify({
  dayStart: "09:00",
  dayEnd: "17:00",
  sessionMinutes: 20,
  gapMinutes: 5,
  lunch: null,
  rounds: "fit",
  briefing: null,
});

const actions: Record<string, Row> = {
  // ── payments (issue 11) ──
  // The entry's driver or car owner only. Car 7's fee is paid in the demo, so its driver is let
  // through and told so (nothing written); withdrawing it is refused because its event is running.
  "app/(entrant)/entries/[entryId]/pay/actions.ts#startCheckoutAction": {
    expect: signedInPage(only(200, "owner")),
    call: action(
      "app/(entrant)/entries/[entryId]/pay/actions.ts#startCheckoutAction",
      (c) => `/entries/${c.entryId}/pay`,
      (c) => ({ entryId: c.entryId }),
      { status: "idle" },
    ),
  },
  "app/(entrant)/entries/[entryId]/withdraw/actions.ts#withdrawEntryAction": {
    expect: signedInPage(only(200, "owner")),
    call: action(
      "app/(entrant)/entries/[entryId]/withdraw/actions.ts#withdrawEntryAction",
      (c) => `/entries/${c.entryId}/withdraw`,
      (c) => ({ entryId: c.entryId, confirm: "yes" }),
      { status: "idle" },
    ),
  },
  // ── end payments ──
  // Each is let through and then refused without writing: a stale revision, no published sheet,
  // no such car.
  "app/(officials)/clerk/[eventId]/actions.ts#buildRunGroupsAction": clerkAction(
    "buildRunGroupsAction",
    (c) => ({ eventId: c.eventId, settings: settingsJson, revision: "999999" }),
  ),
  "app/(officials)/clerk/[eventId]/actions.ts#saveRunGroupsAction": clerkAction(
    "saveRunGroupsAction",
    (c) => ({
      eventId: c.eventId,
      groups: JSON.stringify([{ name: "Group 1", driveIds: [] }]),
      settings: settingsJson,
      revision: "999999",
    }),
  ),
  "app/(officials)/clerk/[eventId]/actions.ts#publishRunSheetAction": clerkAction(
    "publishRunSheetAction",
    (c) => ({ eventId: c.eventId, revision: "999999" }),
  ),
  "app/(officials)/clerk/[eventId]/actions.ts#callSessionAction": clerkAction(
    "callSessionAction",
    (c) => ({ eventId: c.eventId, sessionKey: "1-1", state: "called", note: "" }),
  ),
  "app/(officials)/clerk/[eventId]/actions.ts#askReinspectionAction": clerkAction(
    "askReinspectionAction",
    (c) => ({
      eventId: c.eventId,
      entryId: randomUUID(),
      cause: "incident",
      askedBy: "Clerk of course",
      reason: "matrix test: no such car",
    }),
  ),
  "app/(officials)/tech/[eventId]/chief/actions.ts#closeReinspectionAction": {
    expect: signedInPage(only(200, "chief")),
    call: action(
      "app/(officials)/tech/[eventId]/chief/actions.ts#closeReinspectionAction",
      (c) => `/tech/${c.eventId}/chief`,
      (c) => ({ eventId: c.eventId, reinspectionId: randomUUID(), note: "matrix test" }),
      { status: "idle" },
    ),
  },
  "app/(officials)/organizer/[eventId]/rules/actions.ts#draftRuleSetAction": {
    expect: signedInPage(only(200, "organizer")),
    call: action(
      "app/(officials)/organizer/[eventId]/rules/actions.ts#draftRuleSetAction",
      (c) => `/organizer/${c.eventId}/rules`,
      (c) => ({ eventId: c.eventId, intent: "check", text: "{}", notes: "" }),
      { status: "idle", issues: [] },
    ),
  },
  "app/(officials)/organizer/[eventId]/rules/actions.ts#pinRuleSetAction": {
    // The organizer is let through, and told that no such version exists.
    expect: signedInPage(only(200, "organizer")),
    call: action(
      "app/(officials)/organizer/[eventId]/rules/actions.ts#pinRuleSetAction",
      (c) => `/organizer/${c.eventId}/rules`,
      (c) => ({ eventId: c.eventId, versionId: randomUUID(), confirm: "yes" }),
      { status: "idle" },
    ),
  },
  "app/p/[token]/actions.ts#revokePassAction": {
    expect: only(200, "organizer"),
    call: action(
      "app/p/[token]/actions.ts#revokePassAction",
      (c) => `/p/${c.passToken}`,
      (c) => ({ token: c.passToken, reason: "matrix test: pass revoked" }),
      { status: "idle" },
    ),
  },
  // ── events & entering (issue 11) ─────────────────────────────────────────────────────────
  "app/events/[slug]/enter/actions.ts#enterEventAction": {
    // Any signed-in person may enter their own car; the page is not behind proxy.ts's redirect,
    // so signed out gets "Sign in first." An empty form is refused after the guard.
    expect: signedIn(200),
    call: action(
      "app/events/[slug]/enter/actions.ts#enterEventAction",
      () => "/events/no-such-event/enter",
      () => ({ eventSlug: "no-such-event", carId: "", classId: "", lapTime: "", experience: "" }),
      { status: "idle" },
    ),
  },
  "app/(entrant)/entries/[entryId]/actions.ts#inviteCoDriverAction": {
    // Only the entry's driver may invite: car 7 has its co-driver already, so the driver gets
    // that refusal (past the ownership check, 200) and everyone else the ownership one (403).
    expect: signedInPage(only(200, "owner")),
    call: async (s, c) => {
      const answer = await callServerAction(s, {
        action: "app/(entrant)/entries/[entryId]/actions.ts#inviteCoDriverAction",
        page: `/entries/${c.entryId}`,
        fields: { entryId: c.entryId, coDriverEmail: "someone@matrix.test" },
        state: { status: "idle" },
      });
      if (answer.text.includes("Only the entry's driver")) return 403;
      return actionOutcome(answer);
    },
  },
  "app/invites/[token]/actions.ts#acceptInviteAction": {
    // Whoever is signed in may answer an invitation (the link is the key); an unknown one is refused.
    expect: signedIn(200),
    call: action(
      "app/invites/[token]/actions.ts#acceptInviteAction",
      () => "/invites/unknown-token-of-the-matrix-test",
      () => ({ token: "unknown-token-of-the-matrix-test", lapTime: "1:55", experience: "novice" }),
      { status: "idle" },
    ),
  },
  "app/invites/[token]/actions.ts#declineInviteAction": {
    expect: signedIn(200),
    call: action(
      "app/invites/[token]/actions.ts#declineInviteAction",
      () => "/invites/unknown-token-of-the-matrix-test",
      () => ({ token: "unknown-token-of-the-matrix-test" }),
      { status: "idle" },
    ),
  },
  // ── end of events & entering ─────────────────────────────────────────────────────────────
  // ── pre-check (issue 11, part 6) ──────────────────────────────────────────────────────────
  // A public page; saving and deleting need a signed-in person and act on their own cars and
  // plans only: each caller is let through and refused for a car or plan that is not theirs.
  "app/pre-check/actions.ts#saveAeroPlanAction": {
    expect: signedIn(200),
    call: action(
      "app/pre-check/actions.ts#saveAeroPlanAction",
      () => "/pre-check",
      () => ({
        carId: randomUUID(),
        name: "matrix test",
        plan: JSON.stringify({
          car: {
            bodyWidth: { value: 64, unit: "in" },
            roofHeight: { value: 52, unit: "in" },
            rearmostBodywork: { value: 36, unit: "in" },
          },
          wing: {
            span: { kind: "parts", half: { value: 32, unit: "in" } },
            endPlate: { value: 0.25, unit: "in" },
            chord: { value: 10, unit: "in" },
            height: { value: 58, unit: "in" },
            mount: { distance: { value: 3, unit: "in" }, direction: "behind" },
          },
        }),
      }),
      { status: "idle" },
    ),
  },
  // ── declarations & waiver (issue 11, part 5) ──────────────────────────────────────────────
  // Car 7's driver is let through and refused on the content (a name that is not theirs, a
  // dyno sheet that cannot be true), so nothing is written; anyone else is refused as not the
  // entry's driver. The guardian's link is public: a token never sent is refused in words.
  "app/(entrant)/entries/[entryId]/waiver/actions.ts#signWaiverAction": {
    expect: signedInPage(only(200, "owner")),
    call: action(
      "app/(entrant)/entries/[entryId]/waiver/actions.ts#signWaiverAction",
      (c) => `/entries/${c.entryId}/waiver`,
      (c) => ({ entryId: c.entryId, signedName: "matrix test: not a name" }),
      { status: "idle" },
    ),
  },
  "app/(entrant)/entries/[entryId]/declare/actions.ts#saveDeclarationsAction": {
    expect: signedInPage(only(200, "owner")),
    call: action(
      "app/(entrant)/entries/[entryId]/declare/actions.ts#saveDeclarationsAction",
      (c) => `/entries/${c.entryId}/declare`,
      (c) => ({
        entryId: c.entryId,
        declarations: JSON.stringify({
          dynoSheet: {
            power: { value: 150, unit: "hp" },
            measuredAt: "wheel",
            correction: "sae-j1349",
            ambient: {
              pressure: { value: 5000, unit: "hPa" },
              temperature: { value: 20, unit: "C" },
            },
            date: "2026-04-01",
          },
        }),
      }),
      { status: "idle" },
    ),
  },
  // (pre-check, continued)
  "app/pre-check/actions.ts#deleteAeroPlanAction": {
    expect: signedIn(200),
    call: action(
      "app/pre-check/actions.ts#deleteAeroPlanAction",
      () => "/pre-check",
      () => ({ planId: randomUUID() }),
      { status: "idle" },
    ),
  },
  "app/guardian/[token]/actions.ts#acceptGuardianWaiverAction": {
    expect: all(200),
    call: action(
      "app/guardian/[token]/actions.ts#acceptGuardianWaiverAction",
      () => `/guardian/${"A".repeat(43)}`,
      () => ({ token: "A".repeat(43), guardianName: "matrix test" }),
      { status: "idle" },
    ),
  },
  // ── end declarations & waiver ────────────────────────────────────────────────────────────
  "app/(auth)/sign-in/actions.ts#signInWithPassword": {
    // Public: anyone may try; a wrong password is answered on the form.
    expect: all(200),
    call: action(
      "app/(auth)/sign-in/actions.ts#signInWithPassword",
      () => "/sign-in",
      () => ({ email: "nobody@brackenmoor.test", password: "not-a-password" }),
      {},
    ),
  },
  "app/(auth)/sign-in/actions.ts#signInWithEmailLink": {
    expect: all(200),
    call: action(
      "app/(auth)/sign-in/actions.ts#signInWithEmailLink",
      () => "/sign-in",
      () => ({ email: "not an address" }),
      {},
    ),
  },
  // ── accounts (issue 11) ──
  "app/(auth)/sign-up/actions.ts#signUpWithPassword": {
    // Public: anyone may ask for an account; bad input is answered on the form.
    expect: all(200),
    call: action(
      "app/(auth)/sign-up/actions.ts#signUpWithPassword",
      () => "/sign-up",
      () => ({ email: "not an address", fullName: "", password: "x" }),
      {},
    ),
  },
  "app/(auth)/sign-up/actions.ts#signUpWithEmailLink": {
    expect: all(200),
    call: action(
      "app/(auth)/sign-up/actions.ts#signUpWithEmailLink",
      () => "/sign-up",
      () => ({ email: "not an address", fullName: "" }),
      {},
    ),
  },
  "app/(signed-in)/profile/actions.ts#saveProfile": {
    // Anyone signed in, on their own profile only (the id is the session's, never the form's).
    expect: signedInPage(signedIn(200)),
    call: action(
      "app/(signed-in)/profile/actions.ts#saveProfile",
      () => "/profile",
      () => ({ fullName: "", dateOfBirth: "not a date" }),
      {},
    ),
  },
  // ── end accounts ──
};

// Print layouts: pages, checked by the page itself (loadEventPage); proxy.ts sends a signed-out
// visitor to sign in first.
const printPages: Record<string, Row> = {
  "/tech/[eventId]/print/results": {
    expect: signedInPage(only(200, ...officials)),
    call: get((c) => `/tech/${c.eventId}/print/results`),
  },
  "/tech/[eventId]/print/chief-report": {
    expect: signedInPage(only(200, "chief", "clerk")),
    call: get((c) => `/tech/${c.eventId}/print/chief-report`),
  },
  "/clerk/[eventId]/print/run-sheet": {
    expect: signedInPage(only(200, ...officials)),
    call: get((c) => `/clerk/${c.eventId}/print/run-sheet`),
  },
};

let ctx: Ctx;
let sessions: Record<CallerName, HttpSession>;

beforeAll(async () => {
  const callers = await matrixCallers(appUrl, databaseUrl);
  sessions = callers.sessions;
  const [event] = await queryTestDb<{ rule_set_version_id: string }>(
    databaseUrl,
    "select rule_set_version_id from events where id = ?",
    [callers.eventId],
  );
  // The event's pass key is made on first use; the chief's event pack makes it.
  await sessions.chief.fetch(`/api/events/${callers.eventId}/pack`);
  const [key] = await queryTestDb<{ kid: string; private_key_pkcs8: string }>(
    databaseUrl,
    "select kid, private_key_pkcs8 from event_pass_keys where event_id = ? and retired_at is null limit 1",
    [callers.eventId],
  );
  if (!event || !key) throw new Error("no rule set or pass key");
  ctx = {
    eventId: callers.eventId,
    entryId: callers.ownEntryId,
    versionId: event.rule_set_version_id,
    // A genuine pass of the event (its own key), with an id of its own: revoking it touches
    // no pass another test uses.
    passToken: signPass({
      kid: key.kid,
      privateKeyPkcs8: key.private_key_pkcs8,
      claims: {
        evt: callers.eventId,
        ent: callers.ownEntryId,
        car: 7,
        iat: Math.floor(Date.now() / 1000),
        exp: Math.floor(Date.now() / 1000) + 86_400,
        jti: uuidv7(),
      },
    }),
  };
}, 60_000);
afterAll(() => removeOutsider(databaseUrl));

describe("the authorization matrix", () => {
  it("has a row for every route handler and server action in app/", () => {
    expect(Object.keys(routes).sort()).toEqual(listRouteHandlers());
    const sources = listServerActionSources().filter((a) => !a.endsWith("#signOutAction"));
    expect(Object.keys(actions).sort()).toEqual(sources.sort());
    // And the build under test has exactly these actions (plus signing out, below).
    expect([...listServerActions().keys()].sort()).toEqual(listServerActionSources());
  });

  it("has a row for every print layout in app/", () => {
    expect(Object.keys(printPages).sort()).toEqual(listPrintPages());
  });

  for (const [name, row] of Object.entries({ ...routes, ...actions, ...printPages })) {
    it(name, async () => {
      const got: Partial<Expect> = {};
      for (const caller of callerNames) got[caller] = await row.call(sessions[caller], ctx);
      expect(got).toEqual(row.expect);
    });
  }

  it("app/sign-out-action.ts#signOutAction signs out whoever calls it, and only them", async () => {
    const { sessions: fresh } = await matrixCallers(appUrl, databaseUrl);
    for (const caller of callerNames) {
      const outcome = await callServerAction(fresh[caller], {
        action: "app/sign-out-action.ts#signOutAction",
        page: "/",
        fields: {},
      });
      expect([200, 303]).toContain(outcome.status);
      expect(fresh[caller].hasCookie("authjs.session-token")).toBe(false);
    }
    // The matrix's own sessions are untouched.
    expect((await sessions.scrutineer.fetch("/api/cars")).status).toBe(200);
  });
});
