/** Background Sync tag the service worker listens for. */
export const OUTBOX_SYNC_TAG = "plumbline-outbox";
/** Web Lock name: one tab (or the service worker) drains the outbox at a time. */
export const OUTBOX_LOCK = "plumbline-outbox-drain";
/** BroadcastChannel on which every context announces outbox and pack changes. */
export const OUTBOX_CHANNEL = "plumbline-outbox";
/** The Cache Storage cache that holds the tech line's pages for offline use. */
export const TECH_PAGES_CACHE = "plumbline-pages";
/** Records per sync request. */
export const SYNC_BATCH_SIZE = 50;
