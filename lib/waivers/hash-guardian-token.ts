import { createHash } from "node:crypto";

/** The SHA-256 of a guardian link's token, as lowercase hex: all the database keeps of it. */
export function hashGuardianToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}
