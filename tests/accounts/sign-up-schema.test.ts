import { describe, expect, it } from "vitest";
import { passwordSignUpSchema } from "@/lib/auth/sign-up-schema";

describe("passwordSignUpSchema", () => {
  it("normalizes the address and keeps the password as typed", () => {
    const parsed = passwordSignUpSchema.parse({
      email: " New.Person@Example.TEST ",
      fullName: "New Person",
      password: "correct horse battery",
    });
    expect(parsed.email).toBe("new.person@example.test");
    expect(parsed.password).toBe("correct horse battery");
  });

  it("asks for at least 8 characters", () => {
    // Source: NIST SP 800-63B §5.1.1.2 — chosen memorized secrets are at least 8 characters.
    const short = passwordSignUpSchema.safeParse({
      email: "a@example.test",
      fullName: "A Person",
      password: "1234567",
    });
    expect(short.success).toBe(false);
    expect(short.error?.issues[0]?.message).toBe("Use at least 8 characters");
  });

  it("refuses a password bcrypt would cut (over 72 bytes)", () => {
    // Source: Provos & Mazières, "A Future-Adaptable Password Scheme" (USENIX 1999) — bcrypt's key
    // is at most 72 bytes; "é" is 2 bytes in UTF-8 (RFC 3629).
    const base = { email: "a@example.test", fullName: "A Person" };
    expect(passwordSignUpSchema.safeParse({ ...base, password: "x".repeat(72) }).success).toBe(
      true,
    );
    expect(passwordSignUpSchema.safeParse({ ...base, password: "é".repeat(37) }).success).toBe(
      false,
    );
  });
});
