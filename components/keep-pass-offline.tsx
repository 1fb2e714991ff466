"use client";
import { useEffect, useState } from "react";
import { keepPageForOffline } from "@/lib/offline/keep-page-for-offline";
import { PASS_PAGES_CACHE } from "@/lib/offline/pass-pages-cache";

/** Saves this pass page on the phone on its first visit, so it opens with no signal, and says so
 *  once it is saved. */
export function KeepPassOffline({ path }: { path: string }) {
  const [kept, setKept] = useState(false);
  useEffect(() => {
    keepPageForOffline(path, PASS_PAGES_CACHE)
      .then(() => setKept(true))
      .catch(() => undefined);
  }, [path]);
  return (
    <p
      className="text-base text-asphalt-800 print:hidden"
      data-testid="pass-offline"
      data-kept={kept}
    >
      {kept
        ? "Saved on this phone: it opens without signal."
        : "This page keeps working without signal once it has been saved on this phone."}
    </p>
  );
}
