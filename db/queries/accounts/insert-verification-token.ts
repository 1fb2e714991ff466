import "server-only";
import type { Tx } from "../../run-transaction";
import { verificationTokens } from "../../schema";

/** Store an e-mail link's token, hashed as Auth.js checks it (lib/accounts/hash-link-token.ts). */
export async function insertVerificationToken(
  tx: Tx,
  opts: { identifier: string; tokenHash: string; expires: Date },
): Promise<void> {
  await tx
    .insert(verificationTokens)
    .values({ identifier: opts.identifier, token: opts.tokenHash, expires: opts.expires });
}
