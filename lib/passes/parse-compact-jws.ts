import { decodeBase64Url } from "./decode-base64url";

/** Longest compact JWS we look at, in characters. A pass is about 350; this is generous, and
 *  stops a pasted novel from being decoded on a phone. */
export const maxCompactJwsLength = 4096;

/** A compact JWS split and decoded, not yet verified: nothing in it may be trusted yet. */
export type ParsedCompactJws = {
  /** The protected header, parsed from JSON (an object, but unchecked). */
  header: Record<string, unknown>;
  /** The payload bytes exactly as signed. */
  payload: Uint8Array;
  /** The signature bytes. */
  signature: Uint8Array;
  /** ASCII(BASE64URL(header) || "." || BASE64URL(payload)): the bytes the signature covers
   *  (RFC 7515 §5.2 step 8). */
  signingInput: Uint8Array;
};

export type ParseCompactJwsResult =
  | { ok: true; jws: ParsedCompactJws }
  | { ok: false; reason: string };

const fatalUtf8 = new TextDecoder("utf-8", { fatal: true });

/**
 * Split and decode an RFC 7515 §7.1 compact serialization strictly: exactly three
 * base64url parts (no padding, no whitespace, canonical), a header that is a UTF-8 JSON object,
 * a non-empty payload and signature. Anything else is refused with a reason for logs and tests.
 */
export function parseCompactJws(token: string): ParseCompactJwsResult {
  if (token.length === 0) return { ok: false, reason: "empty" };
  if (token.length > maxCompactJwsLength) return { ok: false, reason: "too long" };
  const parts = token.split(".");
  if (parts.length !== 3) return { ok: false, reason: `expected 3 parts, found ${parts.length}` };
  const [headerPart = "", payloadPart = "", signaturePart = ""] = parts;
  if (!headerPart || !payloadPart || !signaturePart) return { ok: false, reason: "empty part" };

  const headerBytes = decodeBase64Url(headerPart);
  if (!headerBytes) return { ok: false, reason: "header is not base64url" };
  const payload = decodeBase64Url(payloadPart);
  if (!payload) return { ok: false, reason: "payload is not base64url" };
  const signature = decodeBase64Url(signaturePart);
  if (!signature) return { ok: false, reason: "signature is not base64url" };

  let header: unknown;
  try {
    header = JSON.parse(fatalUtf8.decode(headerBytes));
  } catch {
    return { ok: false, reason: "header is not UTF-8 JSON" };
  }
  if (typeof header !== "object" || header === null || Array.isArray(header)) {
    return { ok: false, reason: "header is not a JSON object" };
  }

  return {
    ok: true,
    jws: {
      header: header as Record<string, unknown>,
      payload,
      signature,
      // The parts are pure ASCII (checked by the decoder), so UTF-8 encoding is ASCII here.
      signingInput: new TextEncoder().encode(`${headerPart}.${payloadPart}`),
    },
  };
}
