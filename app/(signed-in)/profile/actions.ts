"use server";
import { revalidatePath } from "next/cache";
import { updateUserProfile } from "@/db/queries/accounts/update-user-profile";
import type { FieldErrors } from "@/lib/errors";
import { type ActionRefusal, defineAction } from "@/lib/http/define-action";
import { profileSchema } from "@/lib/profile/profile-schema";

export type ProfileState = {
  status?: "saved" | "refused";
  message?: string;
  fields?: FieldErrors;
};

const profileFields = [
  "fullName",
  "dateOfBirth",
  "phone",
  "emergencyContactName",
  "emergencyContactPhone",
  "licence",
  "experienceLevel",
] as const;

/** Save the signed-in person's own profile, checked with the form's own schema again. */
export const saveProfile = defineAction({
  fields: profileFields,
  schema: profileSchema,
  access: { signedIn: true },
  refuse: ({ message, fields }: ActionRefusal): ProfileState => ({
    status: "refused",
    message,
    fields,
  }),
  handler: async (profile, { user }): Promise<ProfileState> => {
    await updateUserProfile({ userId: user.id, profile });
    // The header shows the name: render every page's layout again.
    revalidatePath("/", "layout");
    return { status: "saved", message: "Profile saved." };
  },
});
