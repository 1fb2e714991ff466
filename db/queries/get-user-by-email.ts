import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { users } from "../schema";

/**
 * The user with exactly this e-mail address, or null. Pass it normalized
 * (lib/auth/normalize-email.ts); the column compares byte for byte (utf8mb4_bin).
 * Includes the password hash: server only.
 */
export async function getUserByEmail({ email }: { email: string }) {
  const [row] = await getDb()
    .select({
      id: users.id,
      name: users.name,
      email: users.email,
      passwordHash: users.passwordHash,
    })
    .from(users)
    .where(eq(users.email, email))
    .limit(1);
  return row ?? null;
}
