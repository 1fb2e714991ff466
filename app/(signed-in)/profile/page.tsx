import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Caution } from "@/components/caution";
import { ProfileForm } from "@/components/profile-form";
import { getUserProfile } from "@/db/queries/accounts/get-user-profile";
import { requirePageUser } from "@/lib/auth/require-page-permission";
import { saveProfile } from "./actions";

export const metadata: Metadata = { title: "Your profile" };

/** The signed-in person's own profile: what an event needs to know about a driver. */
export default async function ProfilePage() {
  const user = await requirePageUser("/profile");
  const profile = await getUserProfile({ userId: user.id });
  if (!profile) notFound();
  const complete = Boolean(profile.dateOfBirth && profile.phone && profile.experienceLevel);
  return (
    <div className="space-y-6">
      <div className="space-y-2">
        <h1 className="text-3xl font-bold">Your profile</h1>
        <p className="text-base text-asphalt-800">
          Signed in as <span className="font-semibold">{profile.email}</span>
        </p>
        {complete ? null : (
          <p className="text-lg">
            An event needs these before you enter: your date of birth, a phone number, someone to
            call if you are hurt, and your experience.
          </p>
        )}
      </div>
      <ProfileForm
        action={saveProfile}
        initial={{
          fullName: profile.name ?? "",
          dateOfBirth: profile.dateOfBirth ?? "",
          phone: profile.phone ?? "",
          emergencyContactName: profile.emergencyContactName ?? "",
          emergencyContactPhone: profile.emergencyContactPhone ?? "",
          licence: profile.licence ?? "",
          experienceLevel: profile.experienceLevel ?? "",
        }}
      />
      <Caution title="Who sees this">
        The organizers and officials of events you enter see these details. A driver under 18 on an
        event's date needs a parent or guardian to accept the waiver too; the sanctioning body's
        rulebook and local law decide who may drive.
      </Caution>
      <p className="text-base">
        Next:{" "}
        <Link className="font-semibold text-accent underline" href="/events">
          find an event
        </Link>{" "}
        or{" "}
        <Link className="font-semibold text-accent underline" href="/garage">
          add a car to your garage
        </Link>
        .
      </p>
    </div>
  );
}
