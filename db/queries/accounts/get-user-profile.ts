import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../../client";
import { users } from "../../schema";

/** A person's profile as stored (nulls where not given yet), or null when there is no such user. */
export async function getUserProfile({ userId }: { userId: string }) {
  const [row] = await getDb()
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      dateOfBirth: users.dateOfBirth,
      phone: users.phone,
      emergencyContactName: users.emergencyContactName,
      emergencyContactPhone: users.emergencyContactPhone,
      licence: users.licence,
      experienceLevel: users.experienceLevel,
      profileUpdatedAt: users.profileUpdatedAt,
    })
    .from(users)
    .where(eq(users.id, userId))
    .limit(1);
  return row ?? null;
}
export type UserProfileRow = NonNullable<Awaited<ReturnType<typeof getUserProfile>>>;
