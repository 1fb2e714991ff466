import { createHash, randomBytes } from "node:crypto";

/** How long a co-driver invitation link works. */
export const CO_DRIVER_INVITE_DAYS = 14;

/** A new invitation token: 32 random bytes in base64url (43 characters); only its hash is kept. */
export function newInviteToken(): string {
  return randomBytes(32).toString("base64url");
}

/** The SHA-256 of a token, in hex, as `co_driver_invites.token_hash` keeps it. */
export function hashInviteToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}
