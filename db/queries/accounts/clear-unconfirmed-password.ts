import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { getDb } from "../../client";
import { users } from "../../schema";

/**
 * Drop the password of an account whose address was never confirmed. Called when someone proves
 * the mailbox with a sign-in link: a password set by whoever created the account unconfirmed
 * (perhaps not the mailbox's owner) must not keep working once the owner uses the account.
 */
export async function clearUnconfirmedPassword({ email }: { email: string }): Promise<void> {
  await getDb()
    .update(users)
    .set({ passwordHash: null })
    .where(and(eq(users.email, email), isNull(users.emailVerified)));
}
