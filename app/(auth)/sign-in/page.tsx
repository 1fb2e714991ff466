import type { Metadata } from "next";
import Link from "next/link";
import { SignInForms } from "@/components/sign-in-forms";
import { isDemo } from "@/lib/env";
import { safeReturnPath } from "@/lib/http/safe-return-path";
import { signInWithEmailLink, signInWithPassword } from "./actions";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<{ callbackUrl?: string; error?: string }>;
}) {
  const { callbackUrl, error } = await searchParams;
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Sign in</h1>
      {error ? (
        <p className="field-error" role="alert">
          {error === "Verification"
            ? "That sign-in link has expired or was already used. Ask for a new one."
            : "Sign-in did not work. Try again."}
        </p>
      ) : null}
      <SignInForms
        callbackUrl={safeReturnPath(callbackUrl)}
        passwordAction={signInWithPassword}
        emailAction={signInWithEmailLink}
      />
      <p className="text-base">
        New to Plumbline?{" "}
        <Link
          className="font-semibold text-accent underline"
          href={
            callbackUrl && safeReturnPath(callbackUrl) !== "/home"
              ? `/sign-up?callbackUrl=${encodeURIComponent(safeReturnPath(callbackUrl))}`
              : "/sign-up"
          }
        >
          Create an account
        </Link>
        .
      </p>
      {isDemo ? (
        <p className="text-base text-asphalt-800">
          Trying the demo? Sign-in links land in the{" "}
          <Link className="font-semibold text-accent underline" href="/demo/mailbox">
            demo mailbox
          </Link>
          . Demo accounts are listed in the README.
        </p>
      ) : null}
    </div>
  );
}
