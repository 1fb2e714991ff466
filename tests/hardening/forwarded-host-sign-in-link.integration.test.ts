// Issue 8 A1: a request header must never choose the host of a mailed sign-in link or of a
// redirect. Every link and redirect is built from APP_URL.
import { describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { linkIn, listMail, waitForMail } from "../support/mailbox";
import { submitSignInForm } from "../support/sign-in-form";

const appUrl = inject("appUrl");
const mailboxUrl = inject("mailboxUrl");
const appOrigin = new URL(appUrl).origin;
const attacker = { "x-forwarded-host": "evil.example", "x-forwarded-proto": "https" };

async function linkMailedTo(address: string, since: number): Promise<string> {
  const [mail] = await waitForMail(mailboxUrl, since, (m) => m.to.includes(address));
  const link = mail ? linkIn(mail) : undefined;
  expect(link, `a sign-in link mailed to ${address}`).toBeDefined();
  return link ?? "";
}

describe("sign-in links and redirects use the configured origin only", () => {
  it("mails a link to APP_URL when POST /api/auth/signin/nodemailer names another host", async () => {
    const since = Date.now();
    const session = new HttpSession(appUrl);
    const { csrfToken } = (await (await session.fetch("/api/auth/csrf")).json()) as {
      csrfToken: string;
    };
    const response = await session.fetch("/api/auth/signin/nodemailer", {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded", ...attacker },
      body: new URLSearchParams({ csrfToken, email: demo.clerk, callbackUrl: "/home" }),
    });
    expect(new URL(response.headers.get("location") ?? "", appUrl).origin).toBe(appOrigin);
    const link = await linkMailedTo(demo.clerk, since);
    // Source: OWASP Forgot Password Cheat Sheet — build reset/sign-in URLs from a trusted,
    // configured host, never from the request's Host header.
    expect(new URL(link).origin).toBe(appOrigin);
    expect(link.startsWith(`${appOrigin}/api/auth/callback/nodemailer?`)).toBe(true);
  });

  it("mails nothing for another host through the sign-in form's action, and APP_URL links otherwise", async () => {
    const since = Date.now();
    const response = await submitSignInForm(
      new HttpSession(appUrl),
      "link",
      { email: demo.registrar },
      // Next.js runs a server action only when Origin matches the (forwarded) host; an attacker
      // sending their own request sets both.
      { ...attacker, origin: "https://evil.example" },
    );
    expect(response.status).toBeLessThan(500);
    await submitSignInForm(new HttpSession(appUrl), "link", { email: demo.registrar });
    const link = await linkMailedTo(demo.registrar, since);
    expect(new URL(link).origin).toBe(appOrigin);
    const mailed = (await listMail(mailboxUrl, since)).filter((m) => m.to.includes(demo.registrar));
    for (const mail of mailed) expect(new URL(linkIn(mail) ?? appUrl).origin).toBe(appOrigin);
  });

  it("refuses a callbackUrl on another origin after a password sign-in", async () => {
    for (const callbackUrl of [
      "https://evil.example/steal",
      "//evil.example/steal",
      "/\\evil.example",
      "/\t/evil.example",
    ]) {
      const session = new HttpSession(appUrl);
      const { csrfToken } = (await (await session.fetch("/api/auth/csrf")).json()) as {
        csrfToken: string;
      };
      const response = await session.fetch("/api/auth/callback/credentials", {
        method: "POST",
        headers: { "content-type": "application/x-www-form-urlencoded", ...attacker },
        body: new URLSearchParams({
          csrfToken,
          email: demo.clerk,
          password: demo.password,
          callbackUrl,
        }),
      });
      // Source: OWASP Unvalidated Redirects and Forwards Cheat Sheet — only same-site targets.
      const location = new URL(response.headers.get("location") ?? "", appUrl);
      expect(location.origin, callbackUrl).toBe(appOrigin);
      expect(location.pathname.startsWith("//"), callbackUrl).toBe(false);
      expect(location.searchParams.get("error"), callbackUrl).toBeNull();
      expect(session.hasCookie("authjs.session-token"), callbackUrl).toBe(true);
    }
  });

  it("keeps the session cookie for the browser's host, not the forwarded one", async () => {
    const session = new HttpSession(appUrl);
    await session.signInWithPassword(demo.clerk, demo.password);
    const { user } = (await (await session.fetch("/api/auth/session")).json()) as {
      user?: { email?: string };
    };
    expect(user?.email).toBe(demo.clerk);
  });
});
