const alphabet = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_";

/**
 * Bytes → base64url without padding (RFC 4648 §5, as RFC 7515 §2 uses it). Written out by hand
 * rather than with Buffer or btoa so the same code runs on the server and on the phone.
 */
export function encodeBase64Url(bytes: Uint8Array): string {
  let out = "";
  let i = 0;
  for (; i + 2 < bytes.length; i += 3) {
    const n = ((bytes[i] ?? 0) << 16) | ((bytes[i + 1] ?? 0) << 8) | (bytes[i + 2] ?? 0);
    out +=
      alphabet.charAt((n >> 18) & 63) +
      alphabet.charAt((n >> 12) & 63) +
      alphabet.charAt((n >> 6) & 63) +
      alphabet.charAt(n & 63);
  }
  const rest = bytes.length - i;
  if (rest === 1) {
    const n = (bytes[i] ?? 0) << 16;
    out += alphabet.charAt((n >> 18) & 63) + alphabet.charAt((n >> 12) & 63);
  } else if (rest === 2) {
    const n = ((bytes[i] ?? 0) << 16) | ((bytes[i + 1] ?? 0) << 8);
    out +=
      alphabet.charAt((n >> 18) & 63) +
      alphabet.charAt((n >> 12) & 63) +
      alphabet.charAt((n >> 6) & 63);
  }
  return out;
}
