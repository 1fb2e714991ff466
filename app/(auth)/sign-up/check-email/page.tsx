import type { Metadata } from "next";
import Link from "next/link";
import { isDemo } from "@/lib/env";

export const metadata: Metadata = { title: "Check your e-mail" };

/** The one answer to every sign-up: it never says whether the address already had an account. */
export default function SignUpCheckEmailPage() {
  return (
    <div className="space-y-4">
      <h1 className="text-3xl font-bold">Check your e-mail</h1>
      <p className="text-lg">
        We sent a message to the address you gave. Open the link in it to confirm the address and
        sign in; it opens your profile. If that address already has an account, the message says so
        and how to sign in instead.
      </p>
      <p className="text-base text-asphalt-800">
        Nothing after a few minutes? Look in the spam folder, or{" "}
        <Link className="font-semibold text-accent underline" href="/sign-up">
          try again
        </Link>
        .
      </p>
      {isDemo ? (
        <p className="text-base">
          <Link className="font-semibold text-accent underline" href="/demo/mailbox">
            Open the demo mailbox
          </Link>
        </p>
      ) : null}
    </div>
  );
}
