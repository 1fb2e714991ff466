import bcrypt from "bcryptjs";
import { describe, expect, it } from "vitest";
import { DEMO_PASSWORD, DEMO_PASSWORD_HASH } from "@/db/seed/demo-password";
import { hashPassword, verifyPassword } from "@/lib/auth/password";

describe("passwords", () => {
  it("the stored demo hash is a bcrypt hash of the demo password", async () => {
    // Reference: the bcryptjs package's own compare, not our wrapper.
    expect(await bcrypt.compare(DEMO_PASSWORD, DEMO_PASSWORD_HASH)).toBe(true);
  });
  it("verifies a right password and refuses a wrong one or a missing account", async () => {
    const hash = await hashPassword("correct horse");
    expect(await verifyPassword("correct horse", hash)).toBe(true);
    expect(await verifyPassword("wrong horse", hash)).toBe(false);
    expect(await verifyPassword("correct horse", null)).toBe(false);
  });
});
