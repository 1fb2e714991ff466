import { z } from "zod";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";
import { idSchema } from "@/lib/http/id-schema";
import { eventRecordParams, pathEvent } from "@/lib/http/route-params";
import { loadPhoto } from "@/lib/tech/load-photo";

// GET /api/events/[eventId]/photos/[recordId]?entry=<entryId> — a tech-line photo, for officials.
export const GET = defineRoute({
  params: eventRecordParams,
  query: z.object({ entry: idSchema }),
  access: { permission: "tech.read", eventId: pathEvent },
  handler: async (_request, { params, query }) => {
    const photo = await loadPhoto({ ...params, entryId: query.entry });
    if (!photo) throw new AppError("not_found", "No such photo.");
    return new Response(Buffer.from(photo.body), {
      headers: { "content-type": photo.contentType, "cache-control": "private, max-age=86400" },
    });
  },
});
