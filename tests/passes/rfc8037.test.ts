import { createPrivateKey, createPublicKey } from "node:crypto";
import { getPublicKeyAsync } from "@noble/ed25519";
import { describe, expect, it } from "vitest";
import { verifyPass } from "@/lib/offline/verify-pass";
import { decodeBase64Url } from "@/lib/passes/decode-base64url";
import { ed25519JwkThumbprint } from "@/lib/passes/ed25519-jwk-thumbprint";
import { encodeBase64Url } from "@/lib/passes/encode-base64url";
import { generateEventKey } from "@/lib/passes/generate-event-key";
import { parseCompactJws } from "@/lib/passes/parse-compact-jws";
import { signCompactJws } from "@/lib/passes/sign-compact-jws";
import { signPass } from "@/lib/passes/sign-pass";
import { verifyEd25519JwsSignature } from "@/lib/passes/verify-ed25519-jws-signature";

// Source: RFC 8037 Appendix A.1 — the Ed25519 private key as a JWK.
const rfcKey = {
  kty: "OKP",
  crv: "Ed25519",
  d: "nWGxne_9WmC6hEr0kuwsxERJxWl7MmkZcDusAxyuf2A",
  x: "11qYAYKxCrfVS_7TyWQHOg7hcvPapiMlrwIaaPcHURo",
} as const;
// Source: RFC 8037 Appendix A.3 — the JWK thumbprint (RFC 7638) of that public key.
const rfcThumbprint = "kPrK_qmxVWaYVA9wwBF6Iuo3vVzz7TxHCTwXBygrS4k";
// Source: RFC 8037 Appendix A.4 — protected header {"alg":"EdDSA"}, payload
// "Example of Ed25519 signing", and the resulting compact serialization.
const rfcPayload = "Example of Ed25519 signing";
const rfcCompact =
  "eyJhbGciOiJFZERTQSJ9.RXhhbXBsZSBvZiBFZDI1NTE5IHNpZ25pbmc.hgyY0il_MGCjP0JzlnLWG1PPOt7-09PGcvMg3AIbQR6dWbhijcNR4ki4iylGjg5BhVsPt9g7sVvpAr_MuM0KAg";

const rfcPrivateKey = createPrivateKey({ key: rfcKey, format: "jwk" });

/** Verify a compact JWS through our verifier's signature path (the one verifyPass uses). */
async function signatureHolds(compact: string, x: string = rfcKey.x): Promise<boolean> {
  const parsed = parseCompactJws(compact);
  if (!parsed.ok) return false;
  return verifyEd25519JwsSignature({
    signingInput: parsed.jws.signingInput,
    signature: parsed.jws.signature,
    publicKeyX: x,
  });
}

const alphabet = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_";

describe("RFC 8037 Appendix A, through Plumbline's pass code", () => {
  it("derives the A.2 public key from the A.1 private key (Node and @noble/ed25519)", async () => {
    // Source: RFC 8037 Appendix A.2 — the public key "x" that goes with A.1's "d".
    const fromNode = createPublicKey(rfcPrivateKey).export({ format: "jwk" });
    expect(fromNode.x).toBe(rfcKey.x);
    const seed = decodeBase64Url(rfcKey.d);
    expect(seed?.length).toBe(32);
    const fromNoble = await getPublicKeyAsync(seed ?? new Uint8Array());
    expect(encodeBase64Url(fromNoble)).toBe(rfcKey.x);
  });

  it("computes the A.3 JWK thumbprint", () => {
    // Source: RFC 8037 Appendix A.3
    expect(ed25519JwkThumbprint(rfcKey.x)).toBe(rfcThumbprint);
  });

  it("reproduces the A.4 compact serialization exactly with our Node signer", () => {
    // Source: RFC 8037 Appendix A.4 — Ed25519 is deterministic, so the signature must match.
    const compact = signCompactJws({
      protectedHeader: { alg: "EdDSA" },
      payload: new TextEncoder().encode(rfcPayload),
      privateKey: rfcPrivateKey,
    });
    expect(compact).toBe(rfcCompact);
  });

  it("accepts the A.4 example through the verifier's signature path (A.5)", async () => {
    // Source: RFC 8037 Appendix A.4/A.5 — the example verifies with the A.2 public key.
    const parsed = parseCompactJws(rfcCompact);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.jws.header).toEqual({ alg: "EdDSA" });
    expect(new TextDecoder().decode(parsed.jws.payload)).toBe(rfcPayload);
    expect(await signatureHolds(rfcCompact)).toBe(true);
  });

  it("refuses the A.4 example when any single character is changed", async () => {
    // Source: RFC 8037 Appendix A.4, altered one character at a time (every position).
    for (let i = 0; i < rfcCompact.length; i += 1) {
      const c = rfcCompact.charAt(i);
      if (c === ".") continue;
      const other = alphabet.charAt((alphabet.indexOf(c) + 1) % alphabet.length);
      const altered = rfcCompact.slice(0, i) + other + rfcCompact.slice(i + 1);
      expect(await signatureHolds(altered), `position ${i}`).toBe(false);
    }
  });

  it("refuses the A.4 example when any single byte of header, payload or signature is changed", async () => {
    // Source: RFC 8037 Appendix A.4, each decoded byte flipped (xor 0x01) and re-encoded.
    const parts = rfcCompact.split(".").map((p) => decodeBase64Url(p) ?? new Uint8Array());
    let checked = 0;
    for (let part = 0; part < 3; part += 1) {
      const bytes = parts[part] ?? new Uint8Array();
      for (let i = 0; i < bytes.length; i += 1) {
        const changed = parts.map((p) => new Uint8Array(p));
        const target = changed[part] ?? new Uint8Array();
        target[i] = (target[i] ?? 0) ^ 0x01;
        const altered = changed.map(encodeBase64Url).join(".");
        expect(await signatureHolds(altered), `part ${part} byte ${i}`).toBe(false);
        checked += 1;
      }
    }
    // 15 header bytes + 26 payload bytes + 64 signature bytes
    expect(checked).toBe(15 + 26 + 64);
  });

  it("refuses the A.4 signature under a different public key", async () => {
    const other = generateEventKey().publicKeyX;
    expect(other).not.toBe(rfcKey.x);
    expect(await signatureHolds(rfcCompact, other)).toBe(false);
  });

  it("verifyPass accepts a pass signed with the A.1 key, and calls the bare A.4 token malformed", async () => {
    // Source: RFC 8037 Appendix A.1 key; the pass claims are ours.
    const der = rfcPrivateKey.export({ type: "pkcs8", format: "der" }).toString("base64");
    const eventId = "01890a5d-ac96-774b-bcce-b302099a8057";
    const claims = {
      evt: eventId,
      ent: "01890a5d-ac96-774b-bcce-b302099a8058",
      car: 7,
      iat: 1_800_000_000,
      exp: 1_800_086_400,
      jti: "01890a5d-ac96-774b-bcce-b302099a8059",
    };
    const token = signPass({ claims, kid: "rfc8037-a1", privateKeyPkcs8: der });
    const keys = [{ kid: "rfc8037-a1", x: rfcKey.x }];
    const now = new Date(1_800_000_100 * 1000);
    const good = await verifyPass({ token, eventId, keys, revokedPassIds: [], now });
    expect(good).toEqual({ ok: true, claims });
    // A.4's header has no kid or typ and its payload is not pass claims: not a pass.
    const bare = await verifyPass({ token: rfcCompact, eventId, keys, revokedPassIds: [], now });
    expect(bare.ok).toBe(false);
    expect(bare.ok ? "" : bare.code).toBe("malformed");
  });
});
