import { z } from "zod";

/** Largest photo the tech line accepts (phones resize before storing; this is a guard). */
export const MAX_PHOTO_BYTES = 12 * 1024 * 1024;

/** POST /api/events/[eventId]/uploads — the form fields next to the file. */
export const uploadFieldsSchema = z.object({
  recordId: z.uuid({ version: "v7", message: "recordId must be the photo record's id" }),
  entryId: z.uuid({ message: "entryId must be an entry id" }),
  storageKey: z.string().min(1).max(300),
});
