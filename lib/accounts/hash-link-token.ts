import { createHash } from "node:crypto";

/**
 * The stored form of an e-mail link's token, exactly as Auth.js checks it in its e-mail callback
 * (@auth/core lib/actions/callback: SHA-256 hex of the token followed by the secret).
 */
export function hashLinkToken(token: string, secret: string): string {
  return createHash("sha256").update(`${token}${secret}`).digest("hex");
}
