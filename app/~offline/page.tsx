import type { Metadata } from "next";
import { BackOnlineReload } from "@/components/back-online-reload";

export const metadata: Metadata = { title: "No signal" };

// Shown by the service worker for a page that was never saved for offline use.
export default function OfflinePage() {
  return (
    <div className="card space-y-3">
      <h1 className="text-3xl font-bold">No signal</h1>
      <p>
        This page was not saved on this phone. Pages saved with <strong>Prepare for offline</strong>{" "}
        on the tech line still open, and everything you recorded is kept on the phone until it can
        be sent.
      </p>
      <p>This page opens again by itself when the signal is back.</p>
      <BackOnlineReload />
    </div>
  );
}
