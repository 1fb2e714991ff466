import { NextResponse } from "next/server";
import { requirePermission } from "@/lib/auth/require-permission";
import { AppError } from "@/lib/errors";
import { handleRoute } from "@/lib/http/handle-route";
import { idSchema } from "@/lib/http/id-schema";
import { storePhoto } from "@/lib/tech/store-photo";
import { uploadFieldsSchema } from "@/lib/tech/upload-schema";

type Context = { params: Promise<{ eventId: string }> };

// POST /api/events/[eventId]/uploads — a tech-line photo (multipart: file, recordId, entryId,
// storageKey), stored in object storage before its photo record is synced.
export const POST = handleRoute(async (request: Request, { params }: Context) => {
  const eventId = idSchema.parse((await params).eventId);
  const { user } = await requirePermission({ eventId, permission: "readings.write" });
  const form = await request.formData().catch(() => {
    throw new AppError("invalid_input", "Send the photo as multipart form data.", {
      file: ["Missing"],
    });
  });
  const fields = uploadFieldsSchema.parse(
    Object.fromEntries(["recordId", "entryId", "storageKey"].map((k) => [k, form.get(k)])),
  );
  const file = form.get("file");
  if (!(file instanceof File))
    throw new AppError("invalid_input", "No photo in the form.", { file: ["Attach the photo"] });
  const stored = await storePhoto({ eventId, ...fields, file, uploadedBy: user.id });
  return NextResponse.json({ stored }, { status: 201 });
});
