/**
 * The most a request body may hold, in bytes, before it is refused with 413 unread. Sign-in and
 * ordinary forms are small; a sync batch is at most 200 records; a photo is up to 12 MB plus the
 * multipart framing; a rule-set draft is up to 200,000 characters, which UTF-8 may make 800 KB.
 */
export const BODY_LIMITS = {
  signIn: 64 * 1024,
  default: 64 * 1024,
  sync: 1024 * 1024,
  upload: 13 * 1024 * 1024,
  ruleSetDraft: 1024 * 1024,
} as const;

/** One of {@link BODY_LIMITS}' names. */
export type BodyLimit = keyof typeof BODY_LIMITS;

/** "64 KB", "13 MB": a limit as a person reads it. */
export function describeBytes(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${bytes / 1024 / 1024} MB` : `${bytes / 1024} KB`;
}
