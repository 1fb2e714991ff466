import type { Metadata } from "next";
import Link from "next/link";
import { isDemo } from "@/lib/env";

export const metadata: Metadata = { title: "Check your e-mail" };
// The demo mailbox link depends on the server's mode, not on how the build was made.
export const dynamic = "force-dynamic";

export default function CheckEmailPage() {
  return (
    <div className="card space-y-4">
      <h1 className="text-3xl font-bold">Check your e-mail</h1>
      <p>We sent you a sign-in link. Open it on this device; it works once and for 30 minutes.</p>
      {isDemo ? (
        <Link className="btn-primary" href="/demo/mailbox">
          Open the demo mailbox
        </Link>
      ) : null}
    </div>
  );
}
