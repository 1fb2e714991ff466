/** The service worker's cache for the entrant's pass pages: kept longer than the tech line's
 *  pages (a pass opened weeks before the event must still open at the gate with no signal). */
export const PASS_PAGES_CACHE = "plumbline-passes";

/** How long a kept pass page stays usable offline: 45 days. */
export const PASS_PAGES_MAX_AGE_SECONDS = 45 * 24 * 3600;

/** A pass page's path: `/entries/<entryId>/pass`. */
export const PASS_PAGE_PATH = /^\/entries\/[^/]+\/pass\/?$/;
