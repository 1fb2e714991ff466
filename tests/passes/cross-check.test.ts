import { createPrivateKey, createPublicKey, verify as nodeVerify, randomBytes } from "node:crypto";
import { getPublicKeyAsync, signAsync, verifyAsync } from "@noble/ed25519";
import { describe, expect, it } from "vitest";
import { verifyPass } from "@/lib/offline/verify-pass";
import { decodeBase64Url } from "@/lib/passes/decode-base64url";
import { encodeBase64Url } from "@/lib/passes/encode-base64url";
import { parseCompactJws } from "@/lib/passes/parse-compact-jws";
import { at, claimsFor, eventId, issuedAtSeconds, makeEventKey } from "./pass-fixtures";

// Reference implementations: Node's crypto (OpenSSL) and @noble/ed25519 (npm), two independent
// general-purpose Ed25519 libraries, must agree on every pass we sign.
const publicKeyObject = (x: string) =>
  createPublicKey({ key: { kty: "OKP", crv: "Ed25519", x }, format: "jwk" });

describe("Node crypto and @noble/ed25519 agree on our passes", () => {
  it("both accept passes from our signer, and both refuse the same passes altered", async () => {
    for (let i = 0; i < 25; i += 1) {
      const key = makeEventKey();
      const token = key.sign(claimsFor({ car: 2 + i * 397, exp: claimsFor().exp + i }));
      const parsed = parseCompactJws(token);
      expect(parsed.ok).toBe(true);
      if (!parsed.ok) return;
      const { signingInput, signature } = parsed.jws;
      const publicKey = decodeBase64Url(key.publicKeyX) ?? new Uint8Array();
      // Reference: Node crypto.verify (OpenSSL)
      expect(nodeVerify(null, signingInput, publicKeyObject(key.publicKeyX), signature)).toBe(true);
      // Reference: @noble/ed25519 verifyAsync, RFC 8032 strict
      expect(await verifyAsync(signature, signingInput, publicKey, { zip215: false })).toBe(true);
      const bad = new Uint8Array(signature);
      bad[i % 64] = (bad[i % 64] ?? 0) ^ 0x80;
      expect(nodeVerify(null, signingInput, publicKeyObject(key.publicKeyX), bad)).toBe(false);
      expect(await verifyAsync(bad, signingInput, publicKey, { zip215: false })).toBe(false);
    }
  });

  it("our verifier accepts passes signed by @noble/ed25519 from the same private key", async () => {
    const key = makeEventKey();
    // The 32-byte seed is the JWK "d" of the PKCS #8 key.
    const jwk = createPrivateKey({
      key: Buffer.from(key.privateKeyPkcs8, "base64"),
      format: "der",
      type: "pkcs8",
    }).export({ format: "jwk" });
    const seed = decodeBase64Url(jwk.d ?? "") ?? new Uint8Array();
    expect(encodeBase64Url(await getPublicKeyAsync(seed))).toBe(key.publicKeyX);
    const nodeToken = key.sign(claimsFor());
    const [h, p] = nodeToken.split(".");
    const nobleSig = await signAsync(new TextEncoder().encode(`${h}.${p}`), seed);
    // Ed25519 is deterministic (RFC 8032 §5.1.6): both libraries give the same signature.
    expect(`${h}.${p}.${encodeBase64Url(nobleSig)}`).toBe(nodeToken);
    const r = await verifyPass({
      token: nodeToken,
      eventId,
      keys: [key.publicKey],
      revokedPassIds: [],
      now: at(issuedAtSeconds + 60),
    });
    expect(r.ok).toBe(true);
  });

  it("agree on random messages signed by Node and verified by noble, and back", async () => {
    const key = makeEventKey();
    const privateKey = createPrivateKey({
      key: Buffer.from(key.privateKeyPkcs8, "base64"),
      format: "der",
      type: "pkcs8",
    });
    const publicKey = decodeBase64Url(key.publicKeyX) ?? new Uint8Array();
    const { sign: nodeSign } = await import("node:crypto");
    for (let i = 0; i < 20; i += 1) {
      const message = randomBytes(1 + i * 13);
      const sig = nodeSign(null, message, privateKey);
      expect(await verifyAsync(sig, message, publicKey, { zip215: false })).toBe(true);
      message[0] = (message[0] ?? 0) ^ 1;
      expect(await verifyAsync(sig, message, publicKey, { zip215: false })).toBe(false);
      expect(nodeVerify(null, message, publicKeyObject(key.publicKeyX), sig)).toBe(false);
    }
  });
});
