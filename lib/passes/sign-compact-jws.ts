import "server-only";
import { type KeyObject, sign } from "node:crypto";
import { encodeBase64Url } from "./encode-base64url";

/**
 * Sign a payload as an RFC 7515 §7.1 compact JWS with an Ed25519 private key (EdDSA, RFC 8037
 * §3.1): BASE64URL(UTF8(JSON(header))) "." BASE64URL(payload) "." BASE64URL(signature).
 * Ed25519 is deterministic, so the same key, header and payload always give the same token.
 * @param protectedHeader serialized with JSON.stringify, members in the order given
 */
export function signCompactJws({
  protectedHeader,
  payload,
  privateKey,
}: {
  protectedHeader: Record<string, unknown>;
  payload: Uint8Array;
  privateKey: KeyObject;
}): string {
  if (privateKey.asymmetricKeyType !== "ed25519") throw new Error("EdDSA needs an Ed25519 key");
  const encoder = new TextEncoder();
  const signingInput = `${encodeBase64Url(encoder.encode(JSON.stringify(protectedHeader)))}.${encodeBase64Url(payload)}`;
  // For Ed25519 Node takes no digest name: the algorithm hashes internally (RFC 8032 §5.1.6).
  const signature = sign(null, encoder.encode(signingInput), privateKey);
  return `${signingInput}.${encodeBase64Url(new Uint8Array(signature))}`;
}
