import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { getDb } from "../../client";
import { users } from "../../schema";

/** Mark an address confirmed (first time only). */
export async function confirmUserEmail({ email }: { email: string }): Promise<void> {
  await getDb()
    .update(users)
    .set({ emailVerified: new Date() })
    .where(and(eq(users.email, email), isNull(users.emailVerified)));
}
