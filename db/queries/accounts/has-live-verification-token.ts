import "server-only";
import { and, eq, gt } from "drizzle-orm";
import { getDb } from "../../client";
import { verificationTokens } from "../../schema";

/** Whether this hashed token is stored for this address and not expired (it is not used up). */
export async function hasLiveVerificationToken(opts: {
  identifier: string;
  tokenHash: string;
}): Promise<boolean> {
  const [row] = await getDb()
    .select({ expires: verificationTokens.expires })
    .from(verificationTokens)
    .where(
      and(
        eq(verificationTokens.identifier, opts.identifier),
        eq(verificationTokens.token, opts.tokenHash),
        gt(verificationTokens.expires, new Date()),
      ),
    )
    .limit(1);
  return Boolean(row);
}
