import { decodeBase64Url } from "./decode-base64url";

/**
 * 22 base64url characters back to a UUID in its lowercase text form (RFC 9562 §4), or null when
 * the text is not exactly the canonical encoding of 16 bytes (see decodeBase64Url: a changed
 * trailing character can never give the same id).
 */
export function base64UrlToUuid(text: string): string | null {
  if (text.length !== 22) return null;
  const bytes = decodeBase64Url(text);
  if (bytes?.length !== 16) return null;
  const hex = Array.from(bytes, (b) => b.toString(16).padStart(2, "0")).join("");
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
