import { NextResponse } from "next/server";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams, pathEvent } from "@/lib/http/route-params";
import { storePhoto } from "@/lib/tech/store-photo";
import { uploadFieldsSchema } from "@/lib/tech/upload-schema";

/** The photo form: its fields checked by the schema, and the file itself. */
function readUploadForm(form: FormData) {
  const fields = uploadFieldsSchema.parse(
    Object.fromEntries(["recordId", "entryId", "storageKey"].map((k) => [k, form.get(k)])),
  );
  const file = form.get("file");
  if (!(file instanceof File))
    throw new AppError("invalid_input", "No photo in the form.", { file: ["Attach the photo"] });
  return { ...fields, file };
}

// POST /api/events/[eventId]/uploads — a tech-line photo (multipart: file, recordId, entryId,
// storageKey), stored in object storage before its photo record is synced.
export const POST = defineRoute({
  params: eventParams,
  access: { permission: "readings.write", eventId: pathEvent },
  body: { form: readUploadForm, limit: "upload" },
  handler: async (_request, { params, user, body }) => {
    const stored = await storePhoto({ eventId: params.eventId, ...body, uploadedBy: user.id });
    return NextResponse.json({ stored }, { status: 201 });
  },
});
