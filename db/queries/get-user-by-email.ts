import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { users } from "../schema";

/** The user with this e-mail (lower-cased), or null. Includes the password hash: server only. */
export async function getUserByEmail({ email }: { email: string }) {
  const [row] = await getDb()
    .select({
      id: users.id,
      name: users.name,
      email: users.email,
      passwordHash: users.passwordHash,
    })
    .from(users)
    .where(eq(users.email, email.trim().toLowerCase()))
    .limit(1);
  return row ?? null;
}
