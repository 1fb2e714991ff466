import { OUTBOX_CHANNEL } from "./outbox-constants";

export type OfflineChange = { type: "records" | "pack"; eventId: string };

/** Tell every tab (and the page, when the service worker did the work) that something changed. */
export function announceChange(change: OfflineChange): void {
  if (typeof BroadcastChannel === "undefined") return;
  const channel = new BroadcastChannel(OUTBOX_CHANNEL);
  channel.postMessage(change);
  channel.close();
}

/** Listen for changes announced by any context; returns the unsubscribe function. */
export function onOfflineChange(listener: (change: OfflineChange) => void): () => void {
  if (typeof BroadcastChannel === "undefined") return () => {};
  const channel = new BroadcastChannel(OUTBOX_CHANNEL);
  channel.onmessage = (event: MessageEvent<OfflineChange>) => listener(event.data);
  return () => channel.close();
}
