import { NextResponse } from "next/server";
import { clock } from "@/lib/clock";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams, pathEvent } from "@/lib/http/route-params";
import { syncRecords } from "@/lib/tech/sync-records";
import { syncRequestSchema } from "@/lib/tech/sync-schema";

// POST /api/events/[eventId]/sync — accept a batch of tech-line records from a phone's outbox.
// Idempotent by record id; answers per record (stored / duplicate / refused with a reason).
export const POST = defineRoute({
  params: eventParams,
  access: { permission: "readings.write", eventId: pathEvent },
  body: { json: syncRequestSchema, limit: "sync" },
  handler: async (_request, { params, user, roles, body }) => {
    const response = await syncRecords({
      eventId: params.eventId,
      user,
      roles,
      rawRecords: body.records,
      now: clock.now(),
    });
    return NextResponse.json(response, { headers: { "cache-control": "no-store" } });
  },
});
