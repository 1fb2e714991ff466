import { readFileSync } from "node:fs";
import path from "node:path";
import { afterEach, describe, expect, it, vi } from "vitest";
import { type VerifyPassResult, verifyPass } from "@/lib/offline/verify-pass";
import { decodeBase64Url } from "@/lib/passes/decode-base64url";
import { encodeBase64Url } from "@/lib/passes/encode-base64url";
import { passTokenType } from "@/lib/passes/pass-claims-schema";
import { toPassPayload } from "@/lib/passes/to-pass-payload";
import {
  at,
  claimsFor,
  entryId,
  eventId,
  issuedAtSeconds,
  makeEventKey,
  otherEventId,
  passId,
} from "./pass-fixtures";

const key = makeEventKey();
const keys = [key.publicKey];
const good = key.sign(claimsFor());
const during = at(issuedAtSeconds + 3600);

const check = (token: string, extra: Partial<Parameters<typeof verifyPass>[0]> = {}) =>
  verifyPass({ token, eventId, keys, revokedPassIds: [], now: during, ...extra });

const codeOf = (r: VerifyPassResult) => (r.ok ? "ok" : r.code);

/** Rebuild a token with a replaced part (0 header, 1 payload, 2 signature), JSON or bytes. */
function withPart(token: string, index: number, value: unknown): string {
  const parts = token.split(".");
  parts[index] =
    value instanceof Uint8Array
      ? encodeBase64Url(value)
      : encodeBase64Url(new TextEncoder().encode(JSON.stringify(value)));
  return parts.join(".");
}

afterEach(() => {
  vi.unstubAllGlobals();
});

describe("verifyPass", () => {
  it("accepts a good pass and hands back its claims", async () => {
    expect(await check(good)).toEqual({ ok: true, claims: claimsFor() });
  });

  it("refuses a forged pass: the right kid, signed with another key", async () => {
    const forger = makeEventKey();
    const forged = forger.sign(claimsFor(), key.kid);
    const r = await check(forged);
    expect(codeOf(r)).toBe("bad-signature");
    expect(r.ok ? "" : r.message).toBe(
      "This pass has been altered or was not issued by Plumbline.",
    );
    // A forged pass never hands its claims to the screen.
    expect(r.ok ? null : r.claims).toBeUndefined();
  });

  it("refuses altered claims (car number, expiry, entry, event) under the original signature", async () => {
    for (const change of [
      { car: 8 },
      { exp: claimsFor().exp + 86_400 },
      { ent: "0193a4b2-1c00-7000-8000-0000000000e2" },
      { evt: otherEventId },
    ]) {
      const altered = withPart(good, 1, toPassPayload(claimsFor(change)));
      expect(codeOf(await check(altered)), JSON.stringify(change)).toBe("bad-signature");
    }
  });

  it("refuses a pass once now reaches exp (RFC 7519 §4.1.4: now must be before exp)", async () => {
    const exp = claimsFor().exp;
    expect(codeOf(await check(good, { now: at(exp - 1) }))).toBe("ok");
    const r = await check(good, { now: at(exp) });
    expect(codeOf(r)).toBe("expired");
    expect(r.ok ? "" : r.message).toBe("This pass has expired.");
    expect(r.ok ? null : r.claims?.car).toBe(7);
  });

  it("refuses a pass that is not valid yet, allowing a slow clock 5 minutes", async () => {
    const later = key.sign(claimsFor({ iat: issuedAtSeconds + 7200 }));
    expect(codeOf(await check(later, { now: at(issuedAtSeconds + 3600) }))).toBe("not-yet-valid");
    expect(codeOf(await check(later, { now: at(issuedAtSeconds + 7200 - 300) }))).toBe("ok");
    expect(codeOf(await check(good, { now: at(issuedAtSeconds - 301) }))).toBe("not-yet-valid");
    expect(codeOf(await check(good, { now: at(issuedAtSeconds - 300) }))).toBe("ok");
  });

  it("refuses a pass for another event, with the event pack's key or without it", async () => {
    // Signed with a key this phone trusts, but naming another event.
    const elsewhere = key.sign(claimsFor({ evt: otherEventId }));
    const r = await check(elsewhere);
    expect(codeOf(r)).toBe("other-event");
    expect(r.ok ? "" : r.message).toBe("This pass is for another event.");
    // The usual case: another event's key, which this event's pack does not hold.
    const otherKey = makeEventKey();
    const foreign = otherKey.sign(claimsFor({ evt: otherEventId }));
    expect(codeOf(await check(foreign))).toBe("other-event");
  });

  it("refuses a revoked pass", async () => {
    const r = await check(good, {
      revokedPassIds: ["0193a4b2-1c00-7000-8000-0000000000ff", passId],
    });
    expect(codeOf(r)).toBe("revoked");
    expect(r.ok ? "" : r.message).toBe("This pass was revoked by the organizer.");
  });

  it("refuses a pass whose kid is not in the pack", async () => {
    const otherKey = makeEventKey();
    const r = await check(otherKey.sign(claimsFor()));
    expect(codeOf(r)).toBe("unknown-key");
    expect(r.ok ? "" : r.message).toMatch(/Refresh the event pack/);
    expect(codeOf(await check(good, { keys: [] }))).toBe("unknown-key");
  });

  it("picks the key by kid when the pack holds several", async () => {
    const second = makeEventKey();
    const both = [second.publicKey, key.publicKey];
    expect(codeOf(await check(good, { keys: both }))).toBe("ok");
    expect(codeOf(await check(second.sign(claimsFor()), { keys: both }))).toBe("ok");
  });

  it("refuses malformed tokens with reasons", async () => {
    const [h = "", p = "", s = ""] = good.split(".");
    const cases: [string, string][] = [
      ["", "empty"],
      ["not a pass", "one part"],
      [`${h}.${p}`, "two parts"],
      [`${h}.${p}.${s}.${s}`, "four parts"],
      [`${h}.${p}.`, "empty signature"],
      [`${h}=.${p}.${s}`, "padding"],
      [` ${good}`, "leading space"],
      [`${h}.${p}.${s}\n`, "trailing newline"],
      [`${h}.${p}+.${s}`, "standard base64 character"],
      [`${"x".repeat(5000)}.${p}.${s}`, "too long"],
      [withPart(good, 0, [1, 2, 3]), "header is an array"],
      [withPart(good, 0, new TextEncoder().encode("{not json")), "header not JSON"],
      [withPart(good, 0, new Uint8Array([0xff, 0xfe])), "header not UTF-8"],
    ];
    for (const [token, what] of cases) {
      const r = await check(token);
      expect(codeOf(r), what).toBe("malformed");
      expect(r.ok ? "" : r.detail, what).toBeTruthy();
    }
  });

  it("refuses headers that are not exactly a pass header", async () => {
    const header = { alg: "EdDSA", kid: key.kid, typ: passTokenType };
    for (const bad of [
      { ...header, alg: "none" },
      { ...header, alg: "HS256" },
      { ...header, alg: "ES256" },
      { ...header, typ: "JWT" },
      { ...header, typ: "plumbline-pass+jwt" },
      { alg: "EdDSA", kid: key.kid },
      { alg: "EdDSA", typ: passTokenType },
      { ...header, crit: ["exp"] },
      { ...header, jwk: { kty: "OKP", crv: "Ed25519", x: key.publicKeyX } },
    ]) {
      expect(codeOf(await check(withPart(good, 0, bad))), JSON.stringify(bad)).toBe("malformed");
    }
  });

  it("refuses the 'none' algorithm with no signature", async () => {
    const none = [
      encodeBase64Url(new TextEncoder().encode(JSON.stringify({ alg: "none" }))),
      good.split(".")[1],
      "",
    ].join(".");
    expect(codeOf(await check(none))).toBe("malformed");
  });

  it("refuses a correctly signed payload that is not pass claims", async () => {
    const { signCompactJws } = await import("@/lib/passes/sign-compact-jws");
    const { createPrivateKey } = await import("node:crypto");
    const privateKey = createPrivateKey({
      key: Buffer.from(key.privateKeyPkcs8, "base64"),
      format: "der",
      type: "pkcs8",
    });
    const header = { alg: "EdDSA", kid: key.kid, typ: passTokenType };
    const payload0 = toPassPayload(claimsFor());
    for (const payload of [
      "hello",
      JSON.stringify({ ...payload0, car: "7" }),
      JSON.stringify({ ...payload0, exp: payload0.iat }),
      JSON.stringify({ ...payload0, iat: 1.5 }),
      // The ids in their 36-character text form: the old, longer layout is not a pass any more.
      JSON.stringify(claimsFor()),
      // 22 characters whose unused trailing bits are not zero: not the canonical form of an id.
      JSON.stringify({ ...payload0, ent: `${payload0.ent.slice(0, 21)}B` }),
      JSON.stringify({ ...payload0, jti: payload0.jti.slice(0, 21) }),
      JSON.stringify({ ...payload0, evt: undefined }),
    ]) {
      const token = signCompactJws({
        protectedHeader: header,
        payload: new TextEncoder().encode(payload),
        privateKey,
      });
      expect(codeOf(await check(token)), payload).toBe("malformed");
    }
  });

  it("refuses a signature of the wrong length and a damaged key in the pack", async () => {
    const sig = decodeBase64Url(good.split(".")[2] ?? "") ?? new Uint8Array();
    expect(codeOf(await check(withPart(good, 2, sig.slice(0, 63))))).toBe("bad-signature");
    const damaged = [{ kid: key.kid, x: key.publicKeyX.slice(0, 42) }];
    expect(codeOf(await check(good, { keys: damaged }))).toBe("bad-signature");
  });

  it("throws, rather than calling a good pass altered, where the browser has no WebCrypto", async () => {
    vi.stubGlobal("crypto", undefined);
    await expect(check(good)).rejects.toThrow(/https/);
  });

  it("names the entry it verified", async () => {
    const r = await check(good);
    expect(r.ok && r.claims.ent).toBe(entryId);
  });
});

describe("the browser's pass code", () => {
  it("imports nothing Node-only (it runs on the scrutineer's phone)", () => {
    const root = path.resolve(import.meta.dirname, "../..");
    const browserFiles = [
      "lib/offline/verify-pass.ts",
      "lib/passes/parse-compact-jws.ts",
      "lib/passes/decode-base64url.ts",
      "lib/passes/encode-base64url.ts",
      "lib/passes/pass-claims-schema.ts",
      "lib/passes/base64url-to-uuid.ts",
      "lib/passes/uuid-to-base64url.ts",
      "lib/passes/to-pass-payload.ts",
      "lib/passes/pass-public-key-schema.ts",
      "lib/passes/verify-ed25519-jws-signature.ts",
      "lib/passes/pass-url.ts",
      "lib/passes/pass-expiry.ts",
      "lib/passes/format-pass-time.ts",
      "lib/passes/format-event-day.ts",
    ];
    for (const file of browserFiles) {
      const source = readFileSync(path.join(root, file), "utf8");
      expect(source, file).not.toMatch(/from "node:|require\(|server-only|Buffer\.|Date\.now\(/);
    }
  });
});
