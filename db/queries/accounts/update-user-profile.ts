import "server-only";
import { eq } from "drizzle-orm";
import type { Profile } from "@/lib/profile/profile-schema";
import { getDb } from "../../client";
import { users } from "../../schema";

/** Save a person's own profile (the id is the signed-in person's, never the form's). */
export async function updateUserProfile({
  userId,
  profile,
}: {
  userId: string;
  profile: Profile;
}): Promise<void> {
  await getDb()
    .update(users)
    .set({
      name: profile.fullName,
      dateOfBirth: profile.dateOfBirth,
      phone: profile.phone,
      emergencyContactName: profile.emergencyContactName,
      emergencyContactPhone: profile.emergencyContactPhone,
      licence: profile.licence,
      experienceLevel: profile.experienceLevel,
      profileUpdatedAt: new Date(),
    })
    .where(eq(users.id, userId));
}
