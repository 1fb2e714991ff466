// Issue 11, part accounts: a new person creates an account (password or e-mail links), confirms
// the address from the account e-mail, lands signed in on the profile, saves it and is shown by
// name; an address that has an account gets the same answer (its owner gets an e-mail instead);
// bad input is refused with field messages and changes nothing.
// Each test plays its own client address (X-Forwarded-For; tests trust one proxy hop), so the
// sign-in limits other files count are not touched.
import { describe, expect, inject, it } from "vitest";
import { actionOutcome, callServerAction } from "../support/call-server-action";
import { HttpSession } from "../support/http-session";
import { linkIn, waitForMail } from "../support/mailbox";
import { queryTestDb } from "../support/query-test-db";
import { pageText, submitSignInForm } from "../support/sign-in-form";
import { waitForQueueIdle } from "../support/wait-for-queue-idle";
import { submitPageForm } from "./submit-page-form";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const mailboxUrl = inject("mailboxUrl");

const PASSWORD_FORM = 'aria-labelledby="signup-pw-title"';
const LINK_FORM = 'aria-labelledby="signup-link-title"';
const PROFILE = "app/(signed-in)/profile/actions.ts#saveProfile";

async function signUp(
  form: string,
  fields: Record<string, string>,
  client: string,
  session = new HttpSession(appUrl),
) {
  return submitPageForm(session, "/sign-up", form, fields, { "x-forwarded-for": client });
}

/** Follow the account e-mail's link as the browser would: confirm, Auth.js callback, profile. */
async function openAccountLink(session: HttpSession, link: string): Promise<string> {
  let url = link;
  for (let hop = 0; hop < 5; hop += 1) {
    const response = await session.fetch(url);
    const next = response.headers.get("location");
    if (!next) {
      expect(response.status).toBe(200);
      return new URL(url, appUrl).pathname;
    }
    url = new URL(next, url).toString();
  }
  throw new Error("too many redirects");
}

async function accountMail(email: string, since: number) {
  await waitForQueueIdle(databaseUrl);
  return waitForMail(mailboxUrl, since, (m) => m.to.includes(email));
}

const profile = {
  fullName: "Ana Kovač-Reyes",
  dateOfBirth: "1994-05-14",
  phone: "+44 7700 900123",
  emergencyContactName: "Marko Kovač",
  emergencyContactPhone: "+44 7700 900456",
  licence: "Race National 123456",
  experienceLevel: "intermediate",
};

describe("sign up and profile", () => {
  it("comes back to the page it came from (a co-driver invitation), never to another site", async () => {
    // Source: OWASP Unvalidated Redirects and Forwards Cheat Sheet — only same-site paths are
    // taken as a place to return to.
    const since = Date.now();
    const email = "invited.codriver@accounts.test";
    const answer = await submitPageForm(
      new HttpSession(appUrl),
      `/sign-up?callbackUrl=${encodeURIComponent("/invites/some-invitation-token")}`,
      LINK_FORM,
      { email, fullName: "Jo Invited" },
      { "x-forwarded-for": "198.51.100.131" },
    );
    expect(answer.status).toBe(303);
    const [mail] = await accountMail(email, since);
    const link = mail ? linkIn(mail) : "";
    expect(new URL(link ?? "").searchParams.get("next")).toBe("/invites/some-invitation-token");
    expect(await openAccountLink(new HttpSession(appUrl), link ?? "")).toBe(
      "/invites/some-invitation-token",
    );

    const elsewhere = Date.now();
    const other = "elsewhere@accounts.test";
    await submitPageForm(
      new HttpSession(appUrl),
      `/sign-up?callbackUrl=${encodeURIComponent("//evil.test/steal")}`,
      LINK_FORM,
      { email: other, fullName: "Jo Elsewhere", callbackUrl: "https://evil.test/" },
      { "x-forwarded-for": "198.51.100.132" },
    );
    const [second] = await accountMail(other, elsewhere);
    const secondLink = second ? linkIn(second) : "";
    expect(new URL(secondLink ?? "").searchParams.get("next")).toBeNull();
    expect(await openAccountLink(new HttpSession(appUrl), secondLink ?? "")).toBe("/profile");
  });

  it("signs up with a password, confirms by the e-mail, saves the profile, is shown by name", async () => {
    const since = Date.now();
    const email = "new.entrant@accounts.test";
    const answer = await signUp(
      PASSWORD_FORM,
      {
        email: " New.Entrant@Accounts.TEST ",
        fullName: "Ana Kovac",
        password: "paddock-lunch-queue",
      },
      "198.51.100.101",
    );
    expect(answer.status).toBe(303);
    expect(answer.headers.get("location")).toMatch(/\/sign-up\/check-email$/);
    const [user] = await queryTestDb<{ name: string; email_verified: Date | null; hash: string }>(
      databaseUrl,
      "select name, email_verified, password_hash as hash from users where email = ?",
      [email],
    );
    expect(user?.name).toBe("Ana Kovac");
    expect(user?.email_verified).toBeNull();
    expect(user?.hash).toMatch(/^\$2[aby]\$10\$/);

    const [mail] = await accountMail(email, since);
    expect(mail?.subject).toBe("Confirm your Plumbline account");
    const link = mail ? linkIn(mail) : undefined;
    expect(link).toMatch(/\/sign-up\/confirm\?token=[0-9a-f]{64}&email=/);

    const browser = new HttpSession(appUrl);
    expect(await openAccountLink(browser, link ?? "")).toBe("/profile");
    const [confirmed] = await queryTestDb<{ email_verified: Date | null; hash: string | null }>(
      databaseUrl,
      "select email_verified, password_hash as hash from users where email = ?",
      [email],
    );
    expect(confirmed?.email_verified).not.toBeNull();
    expect(confirmed?.hash).toBe(user?.hash); // the password chosen at sign-up stays
    // The link works once.
    expect(await openAccountLink(new HttpSession(appUrl), link ?? "")).toBe("/sign-in");

    const saved = await callServerAction(browser, {
      action: PROFILE,
      page: "/profile",
      fields: profile,
      state: {},
    });
    expect(actionOutcome(saved)).toBe(200);
    expect(saved.text).toContain("Profile saved.");
    const [row] = await queryTestDb<Record<string, unknown>>(
      databaseUrl,
      "select name, cast(date_of_birth as char) as dob, phone, emergency_contact_name as ecn, licence, experience_level as xp from users where email = ?",
      [email],
    );
    expect(row).toMatchObject({
      name: "Ana Kovač-Reyes",
      dob: "1994-05-14",
      phone: "+44 7700 900123",
      ecn: "Marko Kovač",
      licence: "Race National 123456",
      xp: "intermediate",
    });
    // The header shows the saved name (not the address, not the session's older copy).
    const page = await (await browser.fetch("/profile")).text();
    const header = /data-testid="signed-in-as"[^>]*>([\s\S]*?)<\/a>/.exec(page)?.[1] ?? "";
    expect(pageText(header)).toContain("Ana Kovač-Reyes");
    expect(pageText(header)).not.toContain("new.entrant");

    // And the password works for signing in later.
    const again = new HttpSession(appUrl);
    const signedIn = await again.signInWithPassword(email, "paddock-lunch-queue");
    expect(signedIn.headers.get("location")).not.toMatch(/error=/);
    expect(again.hasCookie("authjs.session-token")).toBe(true);
  }, 60_000);

  it("answers the same for an address that has an account, and tells its owner instead", async () => {
    const email = "taken@accounts.test";
    const first = await signUp(LINK_FORM, { email, fullName: "First Owner" }, "198.51.100.111");
    // The first account's own e-mail is sent before the second request is timed.
    const firstSent = Date.now() - 60_000;
    expect((await accountMail(email, firstSent)).map((m) => m.subject)).toEqual([
      "Confirm your Plumbline account",
    ]);
    const since = Date.now();
    const second = await signUp(
      PASSWORD_FORM,
      { email, fullName: "Someone Else", password: "another-password-1" },
      "198.51.100.112",
    );
    expect(second.status).toBe(first.status);
    expect(second.headers.get("location")).toBe(first.headers.get("location"));
    const rows = await queryTestDb<{ name: string; hash: string | null }>(
      databaseUrl,
      "select name, password_hash as hash from users where email = ?",
      [email],
    );
    expect(rows).toEqual([{ name: "First Owner", hash: null }]); // nothing changed
    const mails = await accountMail(email, since);
    expect(mails.map((m) => m.subject)).toEqual(["You already have a Plumbline account"]);
    expect(mails[0]?.text).not.toMatch(/token=/);
  }, 60_000);

  it("refuses bad input with field messages and stores nothing", async () => {
    const response = await signUp(
      PASSWORD_FORM,
      { email: "not an address", fullName: " ", password: "short" },
      "198.51.100.121",
    );
    expect(response.status).toBe(200);
    const text = pageText(await response.text());
    expect(text).toContain("Enter an e-mail address like name@example.com");
    expect(text).toContain("Enter your full name");
    // Source: NIST SP 800-63B §5.1.1.2 — at least 8 characters.
    expect(text).toContain("Use at least 8 characters");
    const [count] = await queryTestDb<{ n: number }>(
      databaseUrl,
      "select count(*) as n from users where email like 'not an%'",
    );
    expect(Number(count?.n)).toBe(0);

    const browser = new HttpSession(appUrl);
    await signUp(
      LINK_FORM,
      { email: "bad-profile@accounts.test", fullName: "Bad Profile" },
      "198.51.100.122",
    );
    const [mail] = await accountMail("bad-profile@accounts.test", Date.now() - 30_000);
    await openAccountLink(browser, (mail && linkIn(mail)) ?? "");
    const refused = await callServerAction(browser, {
      action: PROFILE,
      page: "/profile",
      fields: { ...profile, dateOfBirth: "2999-01-01", phone: "12", experienceLevel: "wizard" },
      state: {},
    });
    expect(refused.text).toContain("A date of birth cannot be in the future");
    expect(refused.text).toContain("Choose your experience level");
    expect(refused.text).toMatch(/Enter your phone number/);
    const [row] = await queryTestDb<{ dob: string | null; phone: string | null }>(
      databaseUrl,
      "select date_of_birth as dob, phone from users where email = ?",
      ["bad-profile@accounts.test"],
    );
    expect(row).toEqual({ dob: null, phone: null });
  }, 60_000);

  it("drops a password set on an unconfirmed account when the mailbox's owner signs in by link", async () => {
    // Source: Sudhodanan & Paverd, "Pre-hijacked Accounts" (USENIX Security 2022) — an account made
    // with someone else's address must not keep its maker's password once the owner takes it up.
    const email = "pre-hijack@accounts.test";
    await signUp(
      PASSWORD_FORM,
      { email, fullName: "Not The Owner", password: "attackers-password" },
      "198.51.100.131",
    );
    const since = Date.now();
    const asked = await submitSignInForm(
      new HttpSession(appUrl),
      "link",
      { email },
      { "x-forwarded-for": "198.51.100.132" },
    );
    expect(asked.status).toBe(303);
    const [mail] = await waitForMail(
      mailboxUrl,
      since,
      (m) => m.to.includes(email) && /sign-in link/.test(m.subject),
    );
    const owner = new HttpSession(appUrl);
    await openAccountLink(owner, (mail && linkIn(mail)) ?? "");
    const [row] = await queryTestDb<{ hash: string | null; verified: Date | null }>(
      databaseUrl,
      "select password_hash as hash, email_verified as verified from users where email = ?",
      [email],
    );
    expect(row?.verified).not.toBeNull();
    expect(row?.hash).toBeNull();
    const attacker = new HttpSession(appUrl);
    const tried = await attacker.signInWithPassword(email, "attackers-password");
    expect(tried.headers.get("location")).toMatch(/error=/);
  }, 60_000);
});
