import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { SignUpForms } from "@/components/sign-up-forms";
import { getSessionUser } from "@/lib/auth/get-session-user";
import { isDemo } from "@/lib/env";
import { safeReturnPath } from "@/lib/http/safe-return-path";
import { signUpWithEmailLink, signUpWithPassword } from "./actions";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({
  searchParams,
}: {
  searchParams: Promise<{ callbackUrl?: string }>;
}) {
  const { callbackUrl } = await searchParams;
  const next = safeReturnPath(callbackUrl, "/profile");
  if (await getSessionUser()) redirect(next);
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Create an account</h1>
      <p className="text-lg">
        For entrants and drivers: enter events, keep your cars in a garage and carry your pass. We
        e-mail you a link to confirm your address; it signs you in and opens your profile.
      </p>
      <SignUpForms
        passwordAction={signUpWithPassword}
        emailAction={signUpWithEmailLink}
        callbackUrl={next === "/profile" ? undefined : next}
      />
      <p className="text-base">
        Already have an account?{" "}
        <Link
          className="font-semibold text-accent underline"
          href={
            next === "/profile" ? "/sign-in" : `/sign-in?callbackUrl=${encodeURIComponent(next)}`
          }
        >
          Sign in
        </Link>
        .
      </p>
      {isDemo ? (
        <p className="text-base text-asphalt-800">
          Trying the demo? The account e-mail lands in the{" "}
          <Link className="font-semibold text-accent underline" href="/demo/mailbox">
            demo mailbox
          </Link>
          .
        </p>
      ) : null}
    </div>
  );
}
