import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type Row = { id: string; car_number: number; email: string };

/** An entry of the demo event with its driver's e-mail, chosen by SQL. */
async function entryWhere(where: string, params: unknown[] = []): Promise<Row> {
  const [row] = await queryTestDb<Row>(
    databaseUrl,
    `select e.id, e.car_number, u.email from entries e join users u on u.id = e.driver_id
     where ${where} order by e.car_number limit 1`,
    params,
  );
  if (!row) throw new Error(`no entry where ${where}`);
  return row;
}

async function signedIn(email: string): Promise<HttpSession> {
  const session = new HttpSession(appUrl);
  await session.signInWithPassword(email, demo.password);
  expect(session.hasCookie("authjs.session-token")).toBe(true);
  return session;
}

/** Open the entrant's pass page and read the pass URL the QR encodes. */
async function openPass(session: HttpSession, entryId: string) {
  const response = await session.fetch(`/entries/${entryId}/pass`);
  const html = await response.text();
  const url = /data-pass-url="([^"]+)"/.exec(html)?.[1] ?? null;
  return { status: response.status, html, url, token: url?.split("/p/")[1] ?? null };
}

let eventId = "";
let own: Row;
let closeDb: (() => Promise<void>) | undefined;

beforeAll(async () => {
  const [event] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from events order by event_date limit 1",
  );
  eventId = event?.id ?? "";
  own = await entryWhere("u.email = ?", [demo.entrant]);
  // The query functions read DATABASE_URL when first imported; point them at this run's database.
  process.env.DATABASE_URL = databaseUrl;
  closeDb = (await import("../../db/client")).closeDb;
});

afterAll(async () => {
  await closeDb?.();
});

describe("the entrant's pass page", () => {
  it("signs one pass and one event key even when the page is opened five times at once", async () => {
    const other = await entryWhere(
      "u.email like 'driver%' and exists (select 1 from payments p where p.entry_id = e.id and p.status = 'paid') and exists (select 1 from waivers w where w.entry_id = e.id and w.is_minor = 0)",
    );
    const session = await signedIn(other.email);
    const pages = await Promise.all(Array.from({ length: 5 }, () => openPass(session, other.id)));
    for (const page of pages) expect(page.status).toBe(200);
    expect(new Set(pages.map((p) => p.token)).size).toBe(1);
    const [keys] = await queryTestDb<{ n: number }>(
      databaseUrl,
      "select count(*) as n from event_pass_keys where event_id = ?",
      [eventId],
    );
    expect(Number(keys?.n)).toBe(1);
    const [passes] = await queryTestDb<{ n: number }>(
      databaseUrl,
      "select count(*) as n from passes where entry_id = ?",
      [other.id],
    );
    expect(Number(passes?.n)).toBe(1);
  });

  it("shows the entrant their own pass: QR, car number, event, class, valid until", async () => {
    const page = await openPass(await signedIn(demo.entrant), own.id);
    expect(page.status).toBe(200);
    expect(page.url).toBe(`${appUrl}/p/${page.token}`);
    expect(page.html).toContain("<svg");
    expect(page.html).toContain("Show this at the tech line");
    expect(page.html).toMatch(new RegExp(`data-testid="pass-car-number"[^>]*>${own.car_number}<`));
    expect(page.html).toContain("Cinder Vale Time Attack");
    expect(page.html).toContain("Valid until");
    expect(page.html).toContain("not a clearance");
  });

  it("says where a moved-up car runs: the declared class and the class the verdict moved it to", async () => {
    const moved = await entryWhere(
      "e.co_driver_id is null and exists (select 1 from verdicts v where v.entry_id = e.id and v.status = 'moved-up' and v.final_class <> e.declared_class) and exists (select 1 from payments p where p.entry_id = e.id and p.status = 'paid') and exists (select 1 from waivers w where w.entry_id = e.id and w.is_minor = 0)",
    );
    const [classes] = await queryTestDb<{ declared: string; final: string }>(
      databaseUrl,
      "select e.declared_class as declared, v.final_class as final from entries e join verdicts v on v.entry_id = e.id where e.id = ?",
      [moved.id],
    );
    const page = await openPass(await signedIn(moved.email), moved.id);
    expect(page.status).toBe(200);
    const line = /data-testid="class-line"[^>]*>(.*?)<\/p>/s.exec(page.html)?.[1] ?? "";
    const text = line.replace(/<[^>]+>/g, "").replace(/<!-- -->/g, "");
    const [ruleSet] = await queryTestDb<{
      body: string | { classes: { id: string; name: string }[] };
    }>(
      databaseUrl,
      "select v.body from events e join rule_set_versions v on v.id = e.rule_set_version_id where e.id = ?",
      [eventId],
    );
    const body: { classes: { id: string; name: string }[] } =
      typeof ruleSet?.body === "string"
        ? JSON.parse(ruleSet.body)
        : (ruleSet?.body ?? { classes: [] });
    const name = (id = "") => body.classes.find((c) => c.id === id)?.name;
    expect(text).toBe(
      `Declared ${name(classes?.declared)} → runs in ${name(classes?.final)} (moved up)`,
    );
    // The pass itself still names only the entry: no class in the signed claims.
    const payload = JSON.parse(
      Buffer.from((page.token ?? "").split(".")[1] ?? "", "base64url").toString("utf8"),
    );
    expect(payload).not.toHaveProperty("cls");
  });

  it("gives the co-driver the same pass (the entry's current pass is reused)", async () => {
    const first = await openPass(await signedIn(demo.entrant), own.id);
    const codriver = await openPass(await signedIn(demo.codriver), own.id);
    expect(codriver.status).toBe(200);
    expect(codriver.token).toBe(first.token);
  });

  it("answers 403 for another entrant's entry, and sends a signed-out visitor to sign-in", async () => {
    const other = await entryWhere("u.email <> ? and e.co_driver_id is null", [demo.entrant]);
    const response = await (await signedIn(demo.entrant)).fetch(`/entries/${other.id}/pass`);
    expect(response.status).toBe(403);
    expect(await response.text()).not.toContain("data-pass-url");
    const anonymous = await new HttpSession(appUrl).fetch(`/entries/${own.id}/pass`);
    expect([302, 303, 307]).toContain(anonymous.status);
    expect(anonymous.headers.get("location")).toMatch(/\/sign-in/);
  });

  it("answers 403 to an official who is not on the entry, and 404 to an id that is no entry", async () => {
    const scrutineer = await signedIn(demo.scrutineer);
    expect((await scrutineer.fetch(`/entries/${own.id}/pass`)).status).toBe(403);
    const entrant = await signedIn(demo.entrant);
    expect((await entrant.fetch("/entries/0193a4b2-1c00-7000-8000-00000000dead/pass")).status).toBe(
      404,
    );
    expect((await entrant.fetch("/entries/not-an-id/pass")).status).toBe(404);
  });

  it("explains why there is no pass yet when a minor's waiver lacks the guardian", async () => {
    const minor = await entryWhere(
      "exists (select 1 from waivers w where w.entry_id = e.id and w.is_minor = 1 and w.guardian_signed_at is null)",
    );
    const page = await openPass(await signedIn(minor.email), minor.id);
    expect(page.status).toBe(200);
    expect(page.token).toBeNull();
    expect(page.html).toContain("guardian");
  });
});

describe("/p/<token>, what a phone camera opens", () => {
  it("says valid for a good pass, with no personal details, and offers officials the tech line", async () => {
    const { token } = await openPass(await signedIn(demo.entrant), own.id);
    const anonymous = await new HttpSession(appUrl).fetch(`/p/${token}`);
    expect(anonymous.status).toBe(200);
    const html = await anonymous.text();
    expect(html).toContain('data-valid="true"');
    expect(html).toContain("Pass valid");
    expect(html).toContain(`Car ${own.car_number}`);
    expect(html).not.toContain("open-on-tech-line");
    const [driver] = await queryTestDb<{ name: string }>(
      databaseUrl,
      "select name from users where email = ?",
      [demo.entrant],
    );
    expect(html).not.toContain(driver?.name ?? "never");
    expect(html).not.toContain(demo.entrant);

    const scrutineer = await (await signedIn(demo.scrutineer)).fetch(`/p/${token}`);
    const officialHtml = await scrutineer.text();
    expect(officialHtml).toContain(`href="/tech/${eventId}?entry=${own.id}"`);
  });

  it("refuses an altered pass in plain words", async () => {
    const { token } = await openPass(await signedIn(demo.entrant), own.id);
    const [h, p = "", s] = (token ?? "").split(".");
    const payload = JSON.parse(Buffer.from(p, "base64url").toString("utf8")) as { car: number };
    payload.car += 1;
    const altered = `${h}.${Buffer.from(JSON.stringify(payload)).toString("base64url")}.${s}`;
    const response = await new HttpSession(appUrl).fetch(`/p/${altered}`);
    expect(response.status).toBe(200);
    const html = await response.text();
    expect(html).toContain('data-valid="false"');
    expect(html).toContain("This pass has been altered or was not issued by Plumbline.");
    expect(html).not.toContain(`Car ${payload.car}`);
    const garbage = await (await new HttpSession(appUrl).fetch("/p/not-a-pass")).text();
    expect(garbage).toContain("This is not a Plumbline pass");
  });

  it("refuses a revoked pass; the event pack lists it; the entrant gets a fresh one", async () => {
    const entrant = await signedIn(demo.entrant);
    const { token } = await openPass(entrant, own.id);
    // The pass carries its id as the UUID's 16 bytes in base64url (22 characters).
    const { base64UrlToUuid } = await import("../../lib/passes/base64url-to-uuid");
    const compactJti = JSON.parse(
      Buffer.from((token ?? "").split(".")[1] ?? "", "base64url").toString("utf8"),
    ).jti as string;
    expect(compactJti).toHaveLength(22);
    const passId = base64UrlToUuid(compactJti) ?? "";
    expect(passId).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-7[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    const [organizer] = await queryTestDb<{ id: string }>(
      databaseUrl,
      "select id from users where email = ?",
      [demo.organizer],
    );
    const { revokePass } = await import("../../db/queries/revoke-pass");
    const { listRevokedPassIds } = await import("../../db/queries/list-revoked-pass-ids");
    const { listEventPassKeys } = await import("../../db/queries/list-event-pass-keys");
    const reason = "Pass shared with another car";
    expect(await revokePass({ eventId, passId, reason, revokedBy: organizer?.id ?? "" })).toEqual({
      revoked: true,
    });
    expect(await revokePass({ eventId, passId, reason, revokedBy: organizer?.id ?? "" })).toEqual({
      revoked: false,
    });

    const html = await (await new HttpSession(appUrl).fetch(`/p/${token}`)).text();
    expect(html).toContain('data-valid="false"');
    expect(html).toContain("This pass was revoked by the organizer.");

    // What the event pack carries: this pass among the revocations, the signing key among the keys.
    expect(await listRevokedPassIds({ eventId })).toContain(passId);
    const kid = JSON.parse(Buffer.from((token ?? "").split(".")[0] ?? "", "base64url").toString())
      .kid as string;
    expect((await listEventPassKeys({ eventId })).map((k) => k.kid)).toContain(kid);

    const fresh = await openPass(entrant, own.id);
    expect(fresh.token).not.toBe(token);
    const freshHtml = await (await new HttpSession(appUrl).fetch(`/p/${fresh.token}`)).text();
    expect(freshHtml).toContain('data-valid="true"');

    const audit = await queryTestDb<{ action: string; actor_id: string | null }>(
      databaseUrl,
      "select action, actor_id from audit_log where subject_type = 'pass' and subject_id = ? order by id",
      [passId],
    );
    expect(audit.map((a) => a.action)).toEqual(["pass.issue", "pass.revoke"]);
    expect(audit[1]?.actor_id).toBe(organizer?.id);
  });

  it("offers the organizer the revoke form, and nobody else", async () => {
    const { token } = await openPass(await signedIn(demo.entrant), own.id);
    const organizer = await (await (await signedIn(demo.organizer)).fetch(`/p/${token}`)).text();
    expect(organizer).toContain("pass-revoke-form");
    const scrutineer = await (await (await signedIn(demo.scrutineer)).fetch(`/p/${token}`)).text();
    expect(scrutineer).not.toContain("pass-revoke-form");
    const anonymous = await (await new HttpSession(appUrl).fetch(`/p/${token}`)).text();
    expect(anonymous).not.toContain("pass-revoke-form");
  });
});
