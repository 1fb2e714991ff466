import { NextResponse } from "next/server";
import { getRuleSetVersion } from "@/db/queries/get-rule-set-version";
import { requirePermission } from "@/lib/auth/require-permission";
import { AppError } from "@/lib/errors";
import { handleRoute } from "@/lib/http/handle-route";
import { idSchema } from "@/lib/http/id-schema";

type Context = { params: Promise<{ eventId: string; versionId: string }> };

// GET /api/events/[eventId]/rule-sets/[versionId] — one saved version of the event's rule set,
// as the JSON file an organizer edits (officials of the event only).
export const GET = handleRoute(async (_request: Request, { params }: Context) => {
  const raw = await params;
  const eventId = idSchema.parse(raw.eventId);
  const versionId = idSchema.parse(raw.versionId);
  await requirePermission({ eventId, permission: "entries.read" });
  const stored = await getRuleSetVersion({ eventId, versionId });
  if (!stored) throw new AppError("not_found", "No such rule-set version in this event.");
  return new NextResponse(JSON.stringify(stored.body, null, 2), {
    headers: {
      "content-type": "application/json; charset=utf-8",
      "content-disposition": `attachment; filename="rule-set-v${stored.version}.json"`,
      "cache-control": "no-store",
    },
  });
});
