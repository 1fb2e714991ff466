"use client";
import { useCallback, useEffect, useRef, useState } from "react";
import { type DrainSummary, drainOutbox } from "@/lib/offline/drain-outbox";
import { requeueSignedOutRecords } from "@/lib/offline/requeue-signed-out-records";

const TICK_MS = 15_000;

/**
 * Keeps the outbox moving while the tech line is open: on opening, on regaining signal, and on a
 * timer (each record's own backoff decides whether it goes). Background Sync covers a closed tab.
 */
export function useOutboxRunner(eventId: string, pending: number) {
  const [online, setOnline] = useState(true);
  const [running, setRunning] = useState(false);
  const [last, setLast] = useState<DrainSummary | null>(null);
  const busy = useRef(false);

  const drain = useCallback(async () => {
    if (busy.current) return;
    busy.current = true;
    setRunning(true);
    try {
      setLast(await drainOutbox({ now: () => Date.now() }));
    } finally {
      busy.current = false;
      setRunning(false);
    }
  }, []);

  useEffect(() => {
    setOnline(navigator.onLine);
    const goOnline = () => {
      setOnline(true);
      void drain();
    };
    const goOffline = () => setOnline(false);
    window.addEventListener("online", goOnline);
    window.addEventListener("offline", goOffline);
    // This page was opened signed in: anything held for sign-in may go now.
    void requeueSignedOutRecords(eventId).then(() => drain());
    return () => {
      window.removeEventListener("online", goOnline);
      window.removeEventListener("offline", goOffline);
    };
  }, [drain, eventId]);

  useEffect(() => {
    if (pending === 0) return;
    const timer = window.setInterval(() => {
      if (navigator.onLine) void drain();
    }, TICK_MS);
    return () => window.clearInterval(timer);
  }, [pending, drain]);

  return { online, running, last, drain };
}
