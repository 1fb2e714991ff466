import { verifyAsync } from "@noble/ed25519";
import { decodeBase64Url } from "./decode-base64url";

/** Ed25519 signature length in bytes (RFC 8032 §5.1.6). */
const signatureBytes = 64;
/** Ed25519 public key length in bytes (RFC 8032 §5.1.5). */
const publicKeyBytes = 32;

/**
 * Check an EdDSA/Ed25519 JWS signature (RFC 8037 §3.1) over the JWS signing input with a public
 * key given as its JWK `x` (base64url of the raw 32 bytes). Uses @noble/ed25519's async verify,
 * which hashes with WebCrypto SHA-512, so it runs unchanged in the browser and in Node 20.
 * Strict RFC 8032 rules (not ZIP-215): non-canonical encodings and small-order keys fail.
 * A wrong-sized key or signature is simply not a valid signature. Throws only when the browser
 * has no WebCrypto (pages served over plain http to another device): refusing every pass as
 * "altered" there would wrongly accuse the entrant.
 */
export async function verifyEd25519JwsSignature({
  signingInput,
  signature,
  publicKeyX,
}: {
  signingInput: Uint8Array;
  signature: Uint8Array;
  publicKeyX: string;
}): Promise<boolean> {
  const publicKey = decodeBase64Url(publicKeyX);
  if (!publicKey || publicKey.length !== publicKeyBytes) return false;
  if (signature.length !== signatureBytes) return false;
  if (!globalThis.crypto?.subtle) {
    throw new Error(
      "This browser cannot check pass signatures here: open Plumbline over https (or on this device's own address).",
    );
  }
  try {
    return await verifyAsync(signature, signingInput, publicKey, { zip215: false });
  } catch {
    return false;
  }
}
