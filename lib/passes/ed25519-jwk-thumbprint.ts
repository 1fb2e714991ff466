import "server-only";
import { createHash } from "node:crypto";

/**
 * The RFC 7638 JWK thumbprint of an Ed25519 public key: SHA-256 over the required members in
 * lexicographic order, `{"crv":"Ed25519","kty":"OKP","x":…}` (RFC 8037 §2), in base64url.
 * @param x the public key as the JWK "x" member (base64url of the raw 32 bytes)
 */
export function ed25519JwkThumbprint(x: string): string {
  const canonical = JSON.stringify({ crv: "Ed25519", kty: "OKP", x });
  return createHash("sha256").update(canonical, "utf8").digest("base64url");
}
