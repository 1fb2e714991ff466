import { NextResponse } from "next/server";
import { boardEtag, etagMatches } from "@/lib/board/board-etag";
import { getPaddockBoard } from "@/lib/board/get-paddock-board";
import { clock } from "@/lib/clock";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams } from "@/lib/http/route-params";

// GET /api/events/[eventId]/board — the public paddock board: car numbers, classes, verdict
// states, the published run sheet and the session calls. If-None-Match → 304 when unchanged.
export const GET = defineRoute({
  params: eventParams,
  access: {
    public: "the sheet on the paddock wall: car numbers, classes, states, run groups, no names",
  },
  handler: async (request, { params }) => {
    const board = await getPaddockBoard({ eventId: params.eventId, now: clock.now() });
    const etag = boardEtag(board);
    // no-cache, not no-store: a browser may keep it, but must ask again every time.
    const headers = { etag, "cache-control": "no-cache" };
    if (etagMatches(request.headers.get("if-none-match"), etag))
      return new NextResponse(null, { status: 304, headers });
    return NextResponse.json(board, { headers });
  },
});
