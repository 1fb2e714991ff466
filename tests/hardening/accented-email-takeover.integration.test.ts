// Issue 8 A2: one person, one exact e-mail address. A sign-in link asked for an address that
// differs from an account's by one accent or by letter case must never sign in as that account.
import { describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { linkIn, listMail, waitForMail } from "../support/mailbox";
import { queryTestDb } from "../support/query-test-db";

const appUrl = inject("appUrl");
const mailboxUrl = inject("mailboxUrl");
const databaseUrl = inject("databaseUrl");

const accented = "organizer@brackenmöor.test"; // one letter: o → ö

async function askForLink(email: string): Promise<Response> {
  const session = new HttpSession(appUrl);
  const { csrfToken } = (await (await session.fetch("/api/auth/csrf")).json()) as {
    csrfToken: string;
  };
  return session.fetch("/api/auth/signin/nodemailer", {
    method: "POST",
    headers: { "content-type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ csrfToken, email, callbackUrl: "/home" }),
  });
}

async function whoOpens(link: string): Promise<string | undefined> {
  const session = new HttpSession(appUrl);
  await session.fetch(new URL(link).pathname + new URL(link).search);
  const body = (await (await session.fetch("/api/auth/session")).json()) as {
    user?: { email?: string };
  } | null;
  return body?.user?.email;
}

describe("one person, one exact e-mail address", () => {
  it("never signs the holder of organizer@brackenmöor.test in as organizer@brackenmoor.test", async () => {
    const since = Date.now();
    const response = await askForLink(accented);
    expect(response.status).toBeLessThan(500);
    // Whatever was mailed for the look-alike went to the look-alike, never to the organizer.
    await waitForMail(mailboxUrl, since, (m) => !m.to.includes(demo.organizer));
    const mails = (await listMail(mailboxUrl, since)).filter((m) => !m.to.includes(demo.organizer));
    // Plumbline mails the look-alike's own link (its domain in ASCII form); refusing would do too.
    for (const mail of mails) {
      const link = linkIn(mail);
      if (!link) continue;
      // Source: RFC 5890 §2.3.2.1 — an internationalized domain label is a different name
      // from its unaccented look-alike; the link's holder is not the organizer.
      expect(await whoOpens(link), `link mailed to ${mail.to.join(", ")}`).not.toBe(demo.organizer);
    }
  });

  it("finds no account for an address that differs only by an accent or by case in the database", async () => {
    const rows = await queryTestDb<{ email: string }>(
      databaseUrl,
      "select email from users where email in (?, ?)",
      [accented, demo.organizer.toUpperCase()],
    );
    expect(rows).toEqual([]);
  });

  it("compares every identifying text column byte for byte", async () => {
    // Ids, tokens, slugs, keys, hashes and addresses: a case- or accent-insensitive collation
    // would let one value find another's row (common practice (no source)).
    const identifying: [string, string][] = [
      ["users", "id"],
      ["users", "email"],
      ["verification_tokens", "identifier"],
      ["verification_tokens", "token"],
      ["sessions", "session_token"],
      ["accounts", "provider_account_id"],
      ["clubs", "slug"],
      ["events", "slug"],
      ["events", "id"],
      ["entries", "id"],
      ["entries", "driver_id"],
      ["records", "id"],
      ["records", "device_id"],
      ["passes", "id"],
      ["passes", "token"],
      ["event_pass_keys", "kid"],
      ["uploads", "object_key"],
      ["uploads", "sha256"],
      ["payments", "provider_ref"],
      ["rule_set_versions", "id"],
    ];
    const rows = await queryTestDb<{ t: string; c: string; collation: string | null }>(
      databaseUrl,
      `select table_name as t, column_name as c, collation_name as collation
         from information_schema.columns where table_schema = database()`,
    );
    for (const [table, column] of identifying) {
      const row = rows.find((r) => r.t === table && r.c === column);
      expect(row?.collation, `${table}.${column}`).toBe("utf8mb4_bin");
    }
    const [event] = await queryTestDb<{ slug: string }>(
      databaseUrl,
      "select slug from events order by event_date limit 1",
    );
    const found = await queryTestDb(databaseUrl, "select id from events where slug = ?", [
      (event?.slug ?? "").toUpperCase(),
    ]);
    expect(found).toEqual([]);
  });

  it("still signs the organizer in when the address is typed with capitals and spaces", async () => {
    const session = new HttpSession(appUrl);
    await session.signInWithPassword(`  ${demo.organizer.toUpperCase()} `, demo.password);
    const body = (await (await session.fetch("/api/auth/session")).json()) as {
      user?: { email?: string };
    };
    expect(body.user?.email).toBe(demo.organizer);
  });
});
