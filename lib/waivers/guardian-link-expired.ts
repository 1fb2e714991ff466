/** How long a guardian's link works after it is sent. */
export const GUARDIAN_LINK_DAYS = 14;

/** True once a guardian link sent at `requestedAt` no longer works at `now`. */
export function guardianLinkExpired(requestedAt: Date, now: Date): boolean {
  return now.getTime() >= requestedAt.getTime() + GUARDIAN_LINK_DAYS * 86_400_000;
}
