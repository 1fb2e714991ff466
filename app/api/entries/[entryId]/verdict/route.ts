import { NextResponse } from "next/server";
import { requireUser } from "@/lib/auth/require-permission";
import { loadEntryResult } from "@/lib/entries/load-entry-result";
import { handleRoute } from "@/lib/http/handle-route";
import { idSchema } from "@/lib/http/id-schema";

type Context = { params: Promise<{ entryId: string }> };

// GET /api/entries/[entryId]/verdict — the entry's scrutineering result, for its entrants and officials.
export const GET = handleRoute(async (_request: Request, { params }: Context) => {
  const entryId = idSchema.parse((await params).entryId);
  const user = await requireUser();
  return NextResponse.json(await loadEntryResult({ entryId, user }), {
    headers: { "cache-control": "no-store" },
  });
});
