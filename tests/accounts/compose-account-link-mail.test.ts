import { describe, expect, it } from "vitest";
import { composeAccountLinkMail } from "@/lib/mail/compose-account-link-mail";
import { composeRunSheetRemovalMail } from "@/lib/mail/compose-run-sheet-removal-mail";
import { composeSignInMail } from "@/lib/mail/compose-sign-in-mail";
import { composeVerdictMail } from "@/lib/mail/compose-verdict-mail";

// Source: RFC 2046 §5.1.4 — the parts of multipart/alternative carry the same content; so the
// text part must hold the link and the words the HTML part shows.
describe("composeAccountLinkMail", () => {
  const url = "http://127.0.0.1:3000/sign-up/confirm?token=ab&email=x%40example.test";

  it("a new account: the link in both parts, escaped in the HTML, and how long it works", () => {
    const mail = composeAccountLinkMail({
      kind: "new",
      fullName: "Ana <Kovač>",
      url,
      validHours: 24,
      withPassword: true,
    });
    expect(mail.subject).toBe("Confirm your Plumbline account");
    expect(mail.text).toContain(url);
    expect(mail.text).toContain("24 hours");
    expect(mail.html).toContain(url.replace(/&/g, "&#38;"));
    expect(mail.html).not.toContain("<Kovač>");
    expect(mail.html).toContain("&#60;Kovač&#62;");
  });

  it("an existing address: nothing created, pointed to sign-in, no link that signs in", () => {
    const mail = composeAccountLinkMail({
      kind: "existing",
      signInUrl: "http://127.0.0.1:3000/sign-in",
    });
    expect(mail.subject).toBe("You already have a Plumbline account");
    expect(mail.text).toContain("nothing was created or changed");
    expect(mail.text).toContain("http://127.0.0.1:3000/sign-in");
    expect(mail.text).not.toContain("token=");
  });
});

describe("the older mails in the one layout", () => {
  it("keep their words and links in both parts", () => {
    const signIn = composeSignInMail({ url: "http://h/x?a=1", host: "h", validMinutes: 30 });
    expect(signIn.text).toContain("http://h/x?a=1");
    expect(signIn.text).toContain("It works once and for 30 minutes.");
    expect(signIn.html).toContain("Sign in to Plumbline");
    const verdict = composeVerdictMail({
      carNumber: 7,
      eventName: "Spring Sprint",
      status: "held",
      className: null,
      reason: "Wing top 205 mm above the roof; limit 203 mm; over by 2 mm.",
      entryUrl: "http://h/entries/1",
      notice: "The chief scrutineer has the final say.",
    });
    expect(verdict.subject).toMatch(/^Car 7: /);
    for (const part of [verdict.text, verdict.html]) {
      expect(part).toContain("over by 2 mm");
      expect(part).toContain("The chief scrutineer has the final say.");
    }
    const removal = composeRunSheetRemovalMail({
      carNumber: 7,
      eventName: "Spring Sprint",
      version: 2,
      entryUrl: "http://h/entries/1",
    });
    expect(removal.text).toContain("not on run sheet version 2");
    expect(removal.text).toContain("http://h/entries/1");
  });
});
