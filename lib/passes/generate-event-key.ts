import "server-only";
import { generateKeyPairSync } from "node:crypto";
import { ed25519JwkThumbprint } from "./ed25519-jwk-thumbprint";

/** Characters of the RFC 7638 thumbprint used as the key id: 96 bits, unique enough for every
 *  key Plumbline will ever make, and 27 characters shorter in every pass QR than the whole. */
export const kidLength = 16;

export type EventKey = {
  /** Key id named in every pass header: the start of the key's RFC 7638 thumbprint. */
  kid: string;
  /** The public key as the JWK "x" member: base64url of the raw 32 bytes (RFC 8037 §2). */
  publicKeyX: string;
  /** The private key, PKCS #8 DER in base64. Server only, never sent anywhere. */
  privateKeyPkcs8: string;
};

/** A fresh Ed25519 key pair for one event's passes (node:crypto, from the OS's CSPRNG). */
export function generateEventKey(): EventKey {
  const { publicKey, privateKey } = generateKeyPairSync("ed25519");
  const jwk = publicKey.export({ format: "jwk" });
  if (typeof jwk.x !== "string") throw new Error("Ed25519 public key exported without x");
  return {
    kid: ed25519JwkThumbprint(jwk.x).slice(0, kidLength),
    publicKeyX: jwk.x,
    privateKeyPkcs8: privateKey.export({ type: "pkcs8", format: "der" }).toString("base64"),
  };
}
