"use client";
import { useCallback, useEffect, useRef, useState } from "react";
import { awaitFreshVerdicts } from "@/lib/offline/await-fresh-verdicts";
import { type DrainSummary, drainOutbox } from "@/lib/offline/drain-outbox";
import { requeueSignedOutRecords } from "@/lib/offline/requeue-signed-out-records";
import { resetOutboxBackoff } from "@/lib/offline/reset-outbox-backoff";

const TICK_MS = 15_000;

/**
 * Keeps the outbox moving while the tech line is open: on opening and on regaining signal (every
 * queued record due at once), and on a timer (each record's own backoff decides whether it goes). Background Sync covers a closed tab.
 * After a sync it looks for the server's new verdicts (`awaitFreshVerdicts`, not awaited: the
 * refreshed pack reaches the page through its own announcement).
 */
export function useOutboxRunner(eventId: string, pending: number) {
  const [online, setOnline] = useState(true);
  const [running, setRunning] = useState(false);
  const [last, setLast] = useState<DrainSummary | null>(null);
  const busy = useRef(false);
  const again = useRef(false);

  const drain = useCallback(async () => {
    if (busy.current) {
      // Asked while a drain runs (e.g. "Send now" during the timer's drain): go once more after.
      again.current = true;
      return;
    }
    busy.current = true;
    setRunning(true);
    try {
      for (let round = 0; round < 2; round += 1) {
        again.current = false;
        const summary = await drainOutbox({ now: () => Date.now() });
        for (const pending of summary.verdictsPending) void awaitFreshVerdicts(pending);
        setLast(summary);
        if (!again.current) break;
      }
    } finally {
      busy.current = false;
      setRunning(false);
    }
  }, []);

  /**
   * "Send now", and the browser's word that the signal is back (`online`, or this page opening
   * with signal): no record waits out its retry time. A drain only sends what is due, so without
   * this, records that failed while offline (the page opened or reloaded in the pit tries once)
   * sat out their backoff until the 15 s timer, and no request went through to make them due.
   */
  const sendNow = useCallback(async () => {
    await resetOutboxBackoff({ now: Date.now(), eventId });
    await drain();
  }, [drain, eventId]);

  useEffect(() => {
    setOnline(navigator.onLine);
    const goOnline = () => {
      setOnline(true);
      void sendNow();
    };
    const goOffline = () => setOnline(false);
    window.addEventListener("online", goOnline);
    window.addEventListener("offline", goOffline);
    // This page was opened signed in: anything held for sign-in may go now.
    void requeueSignedOutRecords(eventId).then(() => (navigator.onLine ? sendNow() : drain()));
    return () => {
      window.removeEventListener("online", goOnline);
      window.removeEventListener("offline", goOffline);
    };
  }, [drain, sendNow, eventId]);

  useEffect(() => {
    if (pending === 0) return;
    const timer = window.setInterval(() => {
      if (navigator.onLine) void drain();
    }, TICK_MS);
    return () => window.clearInterval(timer);
  }, [pending, drain]);

  return { online, running, last, drain, sendNow };
}
