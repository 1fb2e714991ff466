import { NextResponse } from "next/server";
import { getRuleSetVersion } from "@/db/queries/get-rule-set-version";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";
import { eventVersionParams, pathEvent } from "@/lib/http/route-params";

// GET /api/events/[eventId]/rule-sets/[versionId] — one saved version of the event's rule set,
// as the JSON file an organizer edits (officials of the event only).
export const GET = defineRoute({
  params: eventVersionParams,
  access: { permission: "entries.read", eventId: pathEvent },
  handler: async (_request, { params }) => {
    const stored = await getRuleSetVersion(params);
    if (!stored) throw new AppError("not_found", "No such rule-set version in this event.");
    return new NextResponse(JSON.stringify(stored.body, null, 2), {
      headers: {
        "content-type": "application/json; charset=utf-8",
        "content-disposition": `attachment; filename="rule-set-v${stored.version}.json"`,
        "cache-control": "no-store",
      },
    });
  },
});
