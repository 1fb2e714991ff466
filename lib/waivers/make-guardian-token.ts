import { randomBytes } from "node:crypto";
import { hashGuardianToken } from "./hash-guardian-token";

/** A guardian link's token: 32 random bytes in base64url (43 characters), and its SHA-256. */
export function makeGuardianToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashGuardianToken(token) };
}
