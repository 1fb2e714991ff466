import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { base64UrlToUuid } from "@/lib/passes/base64url-to-uuid";
import { passPayloadSchema } from "@/lib/passes/pass-claims-schema";
import { toPassPayload } from "@/lib/passes/to-pass-payload";
import { uuidToBase64Url } from "@/lib/passes/uuid-to-base64url";
import { claimsFor, entryId, eventId, makeEventKey, passId } from "./pass-fixtures";

describe("ids as 22 base64url characters", () => {
  it("encodes the RFC 9562 example UUIDv7, the Nil and the Max UUID", () => {
    // Source: RFC 9562 Appendix A.6 — example UUIDv7 017F22E2-79B0-7CC3-98C4-DC0C0C07398F;
    // its 16 bytes in base64url as Node's Buffer (an independent encoder) writes them.
    const example = "017F22E2-79B0-7CC3-98C4-DC0C0C07398F";
    const reference = Buffer.from(example.replaceAll("-", ""), "hex").toString("base64url");
    expect(reference).toBe("AX8i4nmwfMOYxNwMDAc5jw");
    expect(uuidToBase64Url(example)).toBe(reference);
    expect(base64UrlToUuid(reference)).toBe(example.toLowerCase());
    // Source: RFC 9562 §5.9 Nil UUID (all bits 0) and §5.10 Max UUID (all bits 1); RFC 4648 §5
    // alphabet: 0 is "A", 63 is "_", and the last character holds 2 bits then 4 zero bits.
    expect(uuidToBase64Url("00000000-0000-0000-0000-000000000000")).toBe("A".repeat(22));
    expect(uuidToBase64Url("ffffffff-ffff-ffff-ffff-ffffffffffff")).toBe(`${"_".repeat(21)}w`);
  });

  it("round-trips any UUID, and the text is always 22 characters", () => {
    // Reference: fast-check's uuid generator (every version and variant).
    fc.assert(
      fc.property(fc.uuid(), (uuid) => {
        const short = uuidToBase64Url(uuid);
        expect(short).toMatch(/^[A-Za-z0-9_-]{22}$/);
        expect(base64UrlToUuid(short)).toBe(uuid.toLowerCase());
      }),
    );
  });

  it("refuses text that is not exactly the canonical encoding of 16 bytes", () => {
    const good = uuidToBase64Url(passId);
    expect(base64UrlToUuid(good.slice(0, 21))).toBeNull();
    expect(base64UrlToUuid(`${good}A`)).toBeNull();
    // Source: RFC 4648 §3.5 — canonical encoders set the unused bits to zero; "B" sets one.
    expect(base64UrlToUuid(`${good.slice(0, 21)}B`)).toBeNull();
    expect(base64UrlToUuid(`${good.slice(0, 21)}=`)).toBeNull();
    expect(() => uuidToBase64Url("not-a-uuid")).toThrow();
  });
});

describe("the pass payload", () => {
  it("writes the ids compactly and reads them back as the same claims", () => {
    const payload = toPassPayload(claimsFor());
    expect(Object.keys(payload)).toEqual(["evt", "ent", "car", "iat", "exp", "jti"]);
    expect(payload.evt).toBe(uuidToBase64Url(eventId));
    expect(payload.ent).toBe(uuidToBase64Url(entryId));
    expect(payload.jti).toBe(uuidToBase64Url(passId));
    expect(passPayloadSchema.parse(payload)).toEqual(claimsFor());
  });

  it("is the payload our signer puts in the token, with no issuer or class", () => {
    const token = makeEventKey().sign(claimsFor({ car: 314 }));
    const json = JSON.parse(Buffer.from(token.split(".")[1] ?? "", "base64url").toString("utf8"));
    expect(json).toEqual(toPassPayload(claimsFor({ car: 314 })));
    expect(json).not.toHaveProperty("iss");
    expect(json).not.toHaveProperty("cls");
    const header = JSON.parse(Buffer.from(token.split(".")[0] ?? "", "base64url").toString());
    expect(header).toEqual({ alg: "EdDSA", kid: expect.any(String), typ: "plpass+jwt" });
  });
});
