import { NextResponse } from "next/server";
import { z } from "zod";
import { clock } from "@/lib/clock";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams, pathEvent } from "@/lib/http/route-params";
import { buildEventPack } from "@/lib/tech/build-event-pack";

const packQuery = z.object({
  since: z.iso.datetime({ message: "since must be an ISO 8601 time" }).optional(),
});

// GET /api/events/[eventId]/pack — the event pack a scrutineer's phone keeps for offline use.
// If-None-Match → 304 when nothing changed; ?since=<cursor> → only records received after it.
export const GET = defineRoute({
  params: eventParams,
  query: packQuery,
  access: { permission: "tech.read", eventId: pathEvent },
  handler: async (request, { params, query }) => {
    const pack = await buildEventPack({
      eventId: params.eventId,
      since: query.since ? new Date(query.since) : null,
      now: clock.now(),
    });
    const headers = { etag: pack.etag, "cache-control": "private, no-cache" };
    if (request.headers.get("if-none-match") === pack.etag)
      return new NextResponse(null, { status: 304, headers });
    return NextResponse.json(pack, { headers });
  },
});
