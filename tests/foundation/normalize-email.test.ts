import { describe, expect, it } from "vitest";
import { normalizeEmail } from "@/lib/auth/normalize-email";
import { emailSchema } from "@/lib/auth/sign-in-schema";

describe("normalizeEmail", () => {
  it("trims and lower-cases", () => {
    expect(normalizeEmail("  Organizer@BrackenMoor.TEST ")).toBe("organizer@brackenmoor.test");
  });

  it("keeps an accented domain apart from the plain one (its ASCII form is another name)", () => {
    // Source: RFC 5890 §2.3.2.1 / RFC 3492 — an internationalized label's A-label is `xn--` +
    // Punycode; UTS #46 maps it, so `ö` never becomes `o`.
    const accented = normalizeEmail("organizer@brackenmöor.test");
    expect(accented).not.toBe("organizer@brackenmoor.test");
    expect(accented).toMatch(/^organizer@xn--[a-z0-9-]+\.test$/);
    expect(normalizeEmail("ORGANIZER@BRACKENMÖOR.TEST")).toBe(accented);
  });

  it("refuses what is not a plausible address", () => {
    // Source: RFC 5321 §4.5.3.1.1 — a local part is at most 64 octets.
    for (const bad of [
      "",
      "organizer",
      "@brackenmoor.test",
      "organizer@",
      "organizer@localhost",
      "organizer@brackenmoor.test,evil@evil.test",
      "organizer@evil.test/@brackenmoor.test",
      "organizer@[127.0.0.1]",
      "orgänizer@brackenmoor.test",
      "a b@brackenmoor.test",
      `${"a".repeat(65)}@brackenmoor.test`,
      `a@${"b".repeat(250)}.test`,
    ]) {
      expect(normalizeEmail(bad), bad).toBeNull();
    }
  });

  it("is what the sign-in forms' schema stores, with a message a person can act on", () => {
    expect(emailSchema.parse(" Chief@Brackenmoor.test")).toBe("chief@brackenmoor.test");
    const refused = emailSchema.safeParse("chief@");
    expect(refused.success).toBe(false);
    expect(refused.error?.issues[0]?.message).toBe("Enter an e-mail address like name@example.com");
  });
});
