import { NextResponse } from "next/server";
import { listEventEntries } from "@/db/queries/list-event-entries";
import { requirePermission } from "@/lib/auth/require-permission";
import { handleRoute } from "@/lib/http/handle-route";
import { idSchema } from "@/lib/http/id-schema";

type Context = { params: Promise<{ eventId: string }> };

// GET /api/events/[eventId]/entries — the event's entries with their current verdicts (officials).
export const GET = handleRoute(async (_request: Request, { params }: Context) => {
  const eventId = idSchema.parse((await params).eventId);
  await requirePermission({ eventId, permission: "entries.read" });
  return NextResponse.json({ entries: await listEventEntries({ eventId }) });
});
