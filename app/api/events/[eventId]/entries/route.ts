import { NextResponse } from "next/server";
import { listEventEntries } from "@/db/queries/list-event-entries";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams, pathEvent } from "@/lib/http/route-params";

// GET /api/events/[eventId]/entries — the event's entries with their current verdicts (officials).
export const GET = defineRoute({
  params: eventParams,
  access: { permission: "entries.read", eventId: pathEvent },
  handler: async (_request, { params }) =>
    NextResponse.json({ entries: await listEventEntries({ eventId: params.eventId }) }),
});
