import { NextResponse } from "next/server";
import { z } from "zod";
import { clock } from "@/lib/clock";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams, pathEvent } from "@/lib/http/route-params";
import { buildEventPack } from "@/lib/tech/build-event-pack";

const packQuery = z.object({
  since: z.iso.datetime({ message: "since must be an ISO 8601 time" }).optional(),
  // Pack format 2: the phone merges verdicts by entry, so a partial pack's verdicts can be
  // partial too. Without it (a page loaded before format 2), a partial pack keeps every verdict.
  format: z.enum(["1", "2"], { message: "format must be 1 or 2" }).optional(),
  // What the phone's stored pack holds: a partial pack leaves these out when they are current.
  entries: z.string().max(64).optional(),
  rules: z.string().max(64).optional(),
});

// GET /api/events/[eventId]/pack — the event pack a scrutineer's phone keeps for offline use.
// If-None-Match → 304 when nothing changed; ?since=<cursor> → only records (and, with
// format=2, verdicts) that arrived after it.
export const GET = defineRoute({
  params: eventParams,
  query: packQuery,
  access: { permission: "tech.read", eventId: pathEvent },
  handler: async (request, { params, query }) => {
    const { etag, pack } = await buildEventPack({
      eventId: params.eventId,
      since: query.since ? new Date(query.since) : null,
      partialVerdicts: query.format === "2",
      now: clock.now(),
      ifNoneMatch: request.headers.get("if-none-match"),
      phoneHas: { entriesTag: query.entries, ruleSetVersionId: query.rules },
    });
    const headers = { etag, "cache-control": "private, no-cache" };
    if (!pack) return new NextResponse(null, { status: 304, headers });
    return NextResponse.json(pack, { headers });
  },
});
