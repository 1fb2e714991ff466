import { NextResponse } from "next/server";
import { requirePermission } from "@/lib/auth/require-permission";
import { clock } from "@/lib/clock";
import { handleRoute, parseJsonBody } from "@/lib/http/handle-route";
import { idSchema } from "@/lib/http/id-schema";
import { syncRecords } from "@/lib/tech/sync-records";
import { syncRequestSchema } from "@/lib/tech/sync-schema";

type Context = { params: Promise<{ eventId: string }> };

// POST /api/events/[eventId]/sync — accept a batch of tech-line records from a phone's outbox.
// Idempotent by record id; answers per record (stored / duplicate / refused with a reason).
export const POST = handleRoute(async (request: Request, { params }: Context) => {
  const eventId = idSchema.parse((await params).eventId);
  const { user, roles } = await requirePermission({ eventId, permission: "readings.write" });
  const body = await parseJsonBody(request, syncRequestSchema);
  const response = await syncRecords({
    eventId,
    user,
    roles,
    rawRecords: body.records,
    now: clock.now(),
  });
  return NextResponse.json(response, { headers: { "cache-control": "no-store" } });
});
