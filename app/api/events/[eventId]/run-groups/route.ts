import { NextResponse } from "next/server";
import { clock } from "@/lib/clock";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams, pathEvent } from "@/lib/http/route-params";
import { loadClerkView } from "@/lib/run-sheet/load-clerk-view";

// GET /api/events/[eventId]/run-groups — the clerk of course's view: cars, drives, the draft,
// the published run sheet, the day's session calls and the cars flagged since publication.
export const GET = defineRoute({
  params: eventParams,
  access: { permission: "run-groups.write", eventId: pathEvent },
  handler: async (_request, { params }) =>
    NextResponse.json(await loadClerkView({ eventId: params.eventId, now: clock.now() }), {
      headers: { "cache-control": "no-store" },
    }),
});
