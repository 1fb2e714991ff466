import { encodeBase64Url } from "./encode-base64url";

const uuidShape = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * A UUID's 16 bytes (RFC 9562 §4: the 32 hex digits in order) as 22 base64url characters
 * (RFC 4648 §5, no padding) — 14 characters shorter than the 36-character text form, which is
 * what a pass QR carries. Throws on anything that is not a UUID: we only ever encode our own ids.
 */
export function uuidToBase64Url(uuid: string): string {
  if (!uuidShape.test(uuid)) throw new Error("Not a UUID");
  const hex = uuid.replaceAll("-", "");
  const bytes = new Uint8Array(16);
  for (let i = 0; i < 16; i += 1) bytes[i] = Number.parseInt(hex.slice(i * 2, i * 2 + 2), 16);
  return encodeBase64Url(bytes);
}
