/** Where a tech-line photo lives in object storage: one object per photo record. */
export function photoStorageKey(opts: {
  eventId: string;
  entryId: string;
  recordId: string;
}): string {
  return `events/${opts.eventId}/entries/${opts.entryId}/photos/${opts.recordId}.jpg`;
}
