import { NextResponse } from "next/server";
import { loadEntryResult } from "@/lib/entries/load-entry-result";
import { defineRoute } from "@/lib/http/define-route";
import { entryParams } from "@/lib/http/route-params";

// GET /api/entries/[entryId]/verdict — the entry's scrutineering result, for its entrants and officials.
export const GET = defineRoute({
  params: entryParams,
  access: { entry: ({ params }) => params.entryId },
  handler: async (_request, { params, user }) =>
    NextResponse.json(await loadEntryResult({ entryId: params.entryId, user }), {
      headers: { "cache-control": "no-store" },
    }),
});
