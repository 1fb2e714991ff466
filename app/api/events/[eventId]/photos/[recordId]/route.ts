import { requirePermission } from "@/lib/auth/require-permission";
import { AppError } from "@/lib/errors";
import { handleRoute } from "@/lib/http/handle-route";
import { idSchema } from "@/lib/http/id-schema";
import { getObject } from "@/lib/storage/get-object";
import { photoStorageKey } from "@/lib/tech/photo-storage-key";

type Context = { params: Promise<{ eventId: string; recordId: string }> };

// GET /api/events/[eventId]/photos/[recordId]?entry=<entryId> — a tech-line photo, for officials.
export const GET = handleRoute(async (request: Request, { params }: Context) => {
  const { eventId: rawEvent, recordId: rawRecord } = await params;
  const eventId = idSchema.parse(rawEvent);
  const recordId = idSchema.parse(rawRecord);
  const entryId = idSchema.parse(new URL(request.url).searchParams.get("entry"));
  await requirePermission({ eventId, permission: "tech.read" });
  const object = await getObject(photoStorageKey({ eventId, entryId, recordId }));
  if (!object) throw new AppError("not_found", "No such photo.");
  return new Response(Buffer.from(object.body), {
    headers: { "content-type": object.contentType, "cache-control": "private, max-age=86400" },
  });
});
