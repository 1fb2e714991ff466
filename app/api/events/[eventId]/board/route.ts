import { NextResponse } from "next/server";
import { getPaddockBoard } from "@/lib/board/get-paddock-board";
import { clock } from "@/lib/clock";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams } from "@/lib/http/route-params";

// GET /api/events/[eventId]/board — the public paddock board: car numbers, classes, verdict states.
export const GET = defineRoute({
  params: eventParams,
  access: { public: "the sheet on the paddock wall: car numbers, classes and states, no names" },
  handler: async (_request, { params }) => {
    const board = await getPaddockBoard({ eventId: params.eventId, now: clock.now() });
    return NextResponse.json(board, { headers: { "cache-control": "no-store" } });
  },
});
