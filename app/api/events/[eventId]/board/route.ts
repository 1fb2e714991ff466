import { NextResponse } from "next/server";
import { getPaddockBoard } from "@/lib/board/get-paddock-board";
import { clock } from "@/lib/clock";
import { handleRoute } from "@/lib/http/handle-route";
import { idSchema } from "@/lib/http/id-schema";

type Context = { params: Promise<{ eventId: string }> };

// GET /api/events/[eventId]/board — the public paddock board: car numbers, classes, verdict states.
// Public on purpose (it is the sheet on the paddock wall); it carries no names or readings.
export const GET = handleRoute(async (_request: Request, { params }: Context) => {
  const eventId = idSchema.parse((await params).eventId);
  const board = await getPaddockBoard({ eventId, now: clock.now() });
  return NextResponse.json(board, { headers: { "cache-control": "no-store" } });
});
