import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { GUARDIAN_LINK_DAYS, guardianLinkExpired } from "@/lib/waivers/guardian-link-expired";
import { hashGuardianToken } from "@/lib/waivers/hash-guardian-token";
import { makeGuardianToken } from "@/lib/waivers/make-guardian-token";

describe("guardian link tokens", () => {
  it("hashes with SHA-256 to lowercase hex", () => {
    // Source: FIPS 180-4 / NIST CSRC example values — SHA-256("abc") =
    // ba7816bf 8f01cfea 414140de 5dae2223 b00361a3 96177a9c b410ff61 f20015ad.
    expect(hashGuardianToken("abc")).toBe(
      "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
    );
  });

  it("makes 32 random bytes as base64url (43 characters, no padding) and keeps only the hash", () => {
    // Source: RFC 4648 §5 — base64url alphabet A–Z a–z 0–9 - _; 32 bytes → ⌈256/6⌉ = 43 characters.
    const { token, tokenHash } = makeGuardianToken();
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(Buffer.from(token, "base64url")).toHaveLength(32);
    expect(tokenHash).toBe(createHash("sha256").update(token).digest("hex"));
    expect(tokenHash).not.toContain(token);
    expect(makeGuardianToken().token).not.toBe(token);
  });

  it("expires the link the given number of days after it was sent", () => {
    const sent = new Date("2031-05-01T10:00:00Z");
    const justBefore = new Date(sent.getTime() + GUARDIAN_LINK_DAYS * 86_400_000 - 1);
    expect(guardianLinkExpired(sent, justBefore)).toBe(false);
    expect(guardianLinkExpired(sent, new Date(justBefore.getTime() + 1))).toBe(true);
  });
});
