const alphabet = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_";
const values = new Map<string, number>([...alphabet].map((c, i) => [c, i]));

/**
 * Strict base64url → bytes (RFC 4648 §5 without padding, as RFC 7515 §2 requires), or null.
 * Refused: any character outside the URL-safe alphabet, "=" padding, whitespace, a length that
 * cannot come from whole bytes, and non-canonical text whose unused trailing bits are not zero.
 * The last rule matters for signatures: without it two different strings decode to the same
 * bytes, so changing the final character of a pass could leave it verifying.
 */
export function decodeBase64Url(text: string): Uint8Array | null {
  if (text.length % 4 === 1) return null;
  const out = new Uint8Array(Math.floor((text.length * 3) / 4));
  let buffer = 0;
  let bits = 0;
  let o = 0;
  for (const char of text) {
    const v = values.get(char);
    if (v === undefined) return null;
    buffer = (buffer << 6) | v;
    bits += 6;
    if (bits >= 8) {
      bits -= 8;
      out[o] = (buffer >> bits) & 0xff;
      o += 1;
    }
    buffer &= (1 << bits) - 1;
  }
  // 2 or 4 bits are left over after the last whole byte; a canonical encoder writes them as 0.
  if (buffer !== 0) return null;
  return out;
}
