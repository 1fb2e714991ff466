import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../../client";
import { users } from "../../schema";

/** The name and address a person is shown by, as stored now (a session's copy can be older). */
export async function getUserNames({ userId }: { userId: string }) {
  const [row] = await getDb()
    .select({ name: users.name, email: users.email })
    .from(users)
    .where(eq(users.id, userId))
    .limit(1);
  return row ?? null;
}
