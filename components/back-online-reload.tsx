"use client";
import { useEffect } from "react";

/** On the "No signal" page: opens the page that was asked for again as soon as the signal is
 *  back, so a screen nobody is standing at (the paddock board on a TV) recovers by itself. */
export function BackOnlineReload() {
  useEffect(() => {
    const reload = () => window.location.reload();
    window.addEventListener("online", reload);
    // Some screens never see an "online" event (the network came back while asleep): look again
    // every 30 s, bounded by the page's life.
    const timer = window.setInterval(() => {
      if (navigator.onLine) reload();
    }, 30_000);
    return () => {
      window.removeEventListener("online", reload);
      window.clearInterval(timer);
    };
  }, []);
  return null;
}
