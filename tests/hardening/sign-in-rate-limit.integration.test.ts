// Issue 8 A4: limits on guessing and mail bombing. Password attempts and sign-in e-mails are
// limited per account and per client address, through Auth.js's own endpoints and through the
// sign-in form's server actions; over the limit: 429 with Retry-After and words a person
// understands; an unknown address is limited and worded exactly like a known one.
// Each test plays its own client address through X-Forwarded-For (the test environment trusts
// one proxy, TRUSTED_PROXY_HOPS=1), so the demo accounts the other tests use stay unlimited.
import { v7 as uuidv7 } from "uuid";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD_HASH } from "../../db/seed/demo-password";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { listMail } from "../support/mailbox";
import { queryTestDb } from "../support/query-test-db";
import { pageText, submitSignInForm } from "../support/sign-in-form";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const mailboxUrl = inject("mailboxUrl");

// Limits chosen in lib/auth/sign-in-limit-rules.ts (per 15 minutes): 10 password attempts per
// account, 100 per client address; 5 sign-in e-mails per address. Source: NIST SP 800-63B
// §5.2.2 — at most 100 consecutive failed attempts on one account; fewer is allowed.
const PASSWORD_PER_ACCOUNT = 10;
const PASSWORD_PER_CLIENT = 100;
const LINKS_PER_ACCOUNT = 5;
const ACCOUNT_WORDS = "Too many sign-in attempts for this address. Try again in 15 minutes.";

const known = {
  raw: "limit-raw@brackenmoor.test",
  form: "limit-form@brackenmoor.test",
  busy: "limit-busy@brackenmoor.test",
};

beforeAll(async () => {
  for (const email of Object.values(known)) {
    await queryTestDb(
      databaseUrl,
      "insert into users (id, name, email, password_hash, created_at) values (?, ?, ?, ?, now(3))",
      [uuidv7(), "Limit Test", email, DEMO_PASSWORD_HASH],
    );
  }
});

async function tryPassword(email: string, password: string, client: string): Promise<Response> {
  const session = new HttpSession(appUrl);
  const headers = { "x-forwarded-for": client };
  const { csrfToken } = (await (await session.fetch("/api/auth/csrf", { headers })).json()) as {
    csrfToken: string;
  };
  return session.fetch("/api/auth/callback/credentials", {
    method: "POST",
    headers: { "content-type": "application/x-www-form-urlencoded", ...headers },
    body: new URLSearchParams({ csrfToken, email, password, callbackUrl: "/home" }),
  });
}

async function askForLink(email: string, client: string): Promise<Response> {
  const session = new HttpSession(appUrl);
  const headers = { "x-forwarded-for": client };
  const { csrfToken } = (await (await session.fetch("/api/auth/csrf", { headers })).json()) as {
    csrfToken: string;
  };
  return session.fetch("/api/auth/signin/nodemailer", {
    method: "POST",
    headers: { "content-type": "application/x-www-form-urlencoded", ...headers },
    body: new URLSearchParams({ csrfToken, email, callbackUrl: "/home" }),
  });
}

async function refusal(response: Response) {
  const text = await response.text();
  let message = text;
  try {
    message = (JSON.parse(text) as { error: { message: string } }).error.message;
  } catch {
    // not JSON: keep the text (a redirect has none)
  }
  return {
    status: response.status,
    retryAfter: Number(response.headers.get("retry-after")),
    message,
  };
}

describe("sign-in limits", () => {
  it("stops password guesses on one account, known or unknown, with the same words", async () => {
    for (const [email, client] of [
      [known.raw, "198.51.100.1"],
      ["limit-nobody@brackenmoor.test", "198.51.100.2"],
    ] as const) {
      for (let i = 0; i < PASSWORD_PER_ACCOUNT; i += 1) {
        const response = await tryPassword(email, "not-the-password", client);
        expect(response.status, `attempt ${i + 1} for ${email}`).toBe(302);
      }
      const refused = await refusal(await tryPassword(email, "not-the-password", client));
      // Source: RFC 6585 §4 — 429 Too Many Requests, MAY include Retry-After (RFC 9110 §10.2.3).
      expect(refused.status).toBe(429);
      expect(refused.retryAfter).toBeGreaterThan(14 * 60);
      expect(refused.retryAfter).toBeLessThanOrEqual(15 * 60);
      expect(refused.message).toBe(ACCOUNT_WORDS);
    }
    // The account stays closed from another network, even to the right password.
    const right = await refusal(await tryPassword(known.raw, demo.password, "198.51.100.3"));
    expect(right.status).toBe(429);
    expect(right.message).toBe(ACCOUNT_WORDS);
  }, 120_000);

  it("shows the same words on the sign-in form", async () => {
    const client = { "x-forwarded-for": "198.51.100.20" };
    for (let i = 0; i < PASSWORD_PER_ACCOUNT; i += 1) {
      const html = await (
        await submitSignInForm(
          new HttpSession(appUrl),
          "password",
          { email: known.form, password: "not-the-password" },
          client,
        )
      ).text();
      expect(pageText(html)).toContain("That e-mail and password do not match an account.");
    }
    const response = await submitSignInForm(
      new HttpSession(appUrl),
      "password",
      { email: known.form, password: demo.password },
      client,
    );
    expect(pageText(await response.text())).toContain(ACCOUNT_WORDS);
  }, 120_000);

  it("stops mail bombing one address, through the endpoint and the form", async () => {
    const since = Date.now();
    const victim = "limit-mailbox@brackenmoor.test";
    for (let i = 0; i < LINKS_PER_ACCOUNT; i += 1) {
      expect((await askForLink(victim, `198.51.100.${30 + i}`)).status).toBe(302);
    }
    const refused = await refusal(await askForLink(victim, "198.51.100.40"));
    expect(refused.status).toBe(429);
    expect(refused.retryAfter).toBeGreaterThan(0);
    expect(refused.message).toBe(
      "Too many sign-in links were asked for this address. Try again in 15 minutes.",
    );
    const form = await submitSignInForm(
      new HttpSession(appUrl),
      "link",
      { email: victim },
      { "x-forwarded-for": "198.51.100.41" },
    );
    expect(pageText(await form.text())).toContain(
      "Too many sign-in links were asked for this address. Try again in 15 minutes.",
    );
    // No wait needed: the SMTP fake stores a message before it accepts it (250), and the sign-in
    // request answers only after the mail server accepted the link.
    const mails = (await listMail(mailboxUrl, since)).filter((m) => m.to.includes(victim));
    expect(mails).toHaveLength(LINKS_PER_ACCOUNT);
  }, 120_000);

  it("refuses a post that names two addresses, so a limit counted on a decoy cannot pass a guess on the victim", async () => {
    const victim = known.raw;
    for (const path of ["/api/auth/callback/credentials", "/api/auth/signin/nodemailer"]) {
      const session = new HttpSession(appUrl);
      const headers = { "x-forwarded-for": "198.51.100.70" };
      const { csrfToken } = (await (await session.fetch("/api/auth/csrf", { headers })).json()) as {
        csrfToken: string;
      };
      const body = new URLSearchParams([
        ["csrfToken", csrfToken],
        ["email", `decoy-${uuidv7()}@x.test`],
        ["email", victim],
        ["password", "a-guess"],
      ]);
      const response = await session.fetch(path, {
        method: "POST",
        headers: { "content-type": "application/x-www-form-urlencoded", ...headers },
        body,
      });
      expect(response.status, path).toBe(400);
      expect((await refusal(response)).message).toBe("Send one e-mail address.");
    }
  });

  it("stops one network guessing across many accounts", async () => {
    const client = "198.51.100.50";
    for (let i = 0; i < PASSWORD_PER_CLIENT; i += 1) {
      const response = await tryPassword(`limit-spray-${i}@brackenmoor.test`, "guess", client);
      expect(response.status, `attempt ${i + 1}`).toBe(302);
    }
    const refused = await refusal(
      await tryPassword("limit-spray-last@brackenmoor.test", "guess", client),
    );
    expect(refused.status).toBe(429);
    expect(refused.message).toBe(
      "Too many sign-in attempts from this network. Try again in 15 minutes.",
    );
  }, 180_000);

  it("never counts a right password: a busy morning on one network signs in every time", async () => {
    // common practice (no source): every official at an event shares the paddock Wi-Fi.
    for (let i = 0; i < PASSWORD_PER_ACCOUNT * 3; i += 1) {
      const response = await tryPassword(known.busy, demo.password, "198.51.100.60");
      expect(response.status, `sign-in ${i + 1}`).toBe(302);
      expect(response.headers.get("location")).not.toMatch(/error=/);
    }
  }, 120_000);
});
