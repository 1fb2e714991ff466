import { describe, expect, it } from "vitest";
import { composeGuardianRequestMail } from "@/lib/mail/compose-guardian-request-mail";
import { composePassReadyMail } from "@/lib/mail/compose-pass-ready-mail";

describe("composeGuardianRequestMail", () => {
  const mail = composeGuardianRequestMail({
    minorName: "Sam <Tester>",
    guardianName: "Alex Tester",
    eventName: "Test Sprint",
    eventDateText: "Sat 12 Jun 2027",
    carNumber: 12,
    url: "http://127.0.0.1:3000/guardian/abc?x=1&y=2",
    linkDays: 14,
  });

  it("names the minor, the event and the link, in the text part", () => {
    expect(mail.subject).toContain("Sam <Tester>");
    expect(mail.text).toContain("Dear Alex Tester,");
    expect(mail.text).toContain("Test Sprint");
    expect(mail.text).toContain("http://127.0.0.1:3000/guardian/abc?x=1&y=2");
    expect(mail.text).toMatch(/works once, for 14 days/);
  });

  it("escapes what it quotes in the HTML part", () => {
    // Source: HTML Living Standard §13.1.2.6 — "<" in text must be written as a character reference.
    expect(mail.html).toContain("Sam &#60;Tester&#62;");
    expect(mail.html).not.toContain("<Tester>");
    expect(mail.html).toContain('href="http://127.0.0.1:3000/guardian/abc?x=1&#38;y=2"');
  });
});

describe("composePassReadyMail", () => {
  it("tells the driver the entry is signed on and links the pass", () => {
    const mail = composePassReadyMail({
      driverName: "Jo Driver",
      eventName: "Test Sprint",
      eventDateText: "Sat 12 Jun 2027",
      carNumber: 7,
      passUrl: "http://127.0.0.1:3000/entries/e1/pass",
    });
    expect(mail.subject).toBe("Your pass for Test Sprint is ready — car 7");
    expect(mail.text).toContain("Hello Jo Driver,");
    expect(mail.text).toContain("http://127.0.0.1:3000/entries/e1/pass");
    expect(mail.text).toContain("not a safety clearance");
    expect(mail.html).toContain('href="http://127.0.0.1:3000/entries/e1/pass"');
  });
});
