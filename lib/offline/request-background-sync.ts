import { OUTBOX_SYNC_TAG } from "./outbox-constants";

type SyncManager = { register: (tag: string) => Promise<void> };

/** Ask the browser to wake the service worker when there is signal (Background Sync, where the
 *  browser has it). The page's own timer and the `online` event cover browsers without it. */
export async function requestBackgroundSync(): Promise<boolean> {
  if (typeof navigator === "undefined" || !("serviceWorker" in navigator)) return false;
  try {
    const registration = (await navigator.serviceWorker.ready) as ServiceWorkerRegistration & {
      sync?: SyncManager;
    };
    if (!registration.sync) return false;
    await registration.sync.register(OUTBOX_SYNC_TAG);
    return true;
  } catch {
    return false;
  }
}
