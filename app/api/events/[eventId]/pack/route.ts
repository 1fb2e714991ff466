import { NextResponse } from "next/server";
import { z } from "zod";
import { requirePermission } from "@/lib/auth/require-permission";
import { clock } from "@/lib/clock";
import { handleRoute } from "@/lib/http/handle-route";
import { idSchema } from "@/lib/http/id-schema";
import { buildEventPack } from "@/lib/tech/build-event-pack";

type Context = { params: Promise<{ eventId: string }> };

const sinceSchema = z.iso.datetime({ message: "since must be an ISO 8601 time" }).nullable();

// GET /api/events/[eventId]/pack — the event pack a scrutineer's phone keeps for offline use.
// If-None-Match → 304 when nothing changed; ?since=<cursor> → only records received after it.
export const GET = handleRoute(async (request: Request, { params }: Context) => {
  const eventId = idSchema.parse((await params).eventId);
  await requirePermission({ eventId, permission: "tech.read" });
  const since = sinceSchema.parse(new URL(request.url).searchParams.get("since"));
  const pack = await buildEventPack({
    eventId,
    since: since ? new Date(since) : null,
    now: clock.now(),
  });
  const headers = { etag: pack.etag, "cache-control": "private, no-cache" };
  if (request.headers.get("if-none-match") === pack.etag)
    return new NextResponse(null, { status: 304, headers });
  return NextResponse.json(pack, { headers });
});
