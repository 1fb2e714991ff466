import type { Metadata } from "next";
import { BackOnlineReload } from "@/components/back-online-reload";
import { NoSignalWords } from "@/components/no-signal-words";

export const metadata: Metadata = { title: "No signal" };

// Shown by the service worker for a page that was never saved for offline use, at the address
// that was asked for; the words follow that address. It carries `no-signal-page`, which hides
// the header's account area (components/hide-on-board.tsx): this copy was saved whenever the
// service worker installed, so it cannot know who is signed in now, and with no signal nobody
// can sign in or out anyway.
export default function OfflinePage() {
  return (
    <div className="no-signal-page card space-y-3">
      <h1 className="text-3xl font-bold">No signal</h1>
      <NoSignalWords />
      <p>This page opens again by itself when the signal is back.</p>
      <BackOnlineReload />
    </div>
  );
}
