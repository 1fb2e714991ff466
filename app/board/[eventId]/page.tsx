import "@fontsource/barlow-semi-condensed/700.css";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PaddockBoard } from "@/components/board/paddock-board";
import { boardEtag } from "@/lib/board/board-etag";
import type { BoardSnapshot } from "@/lib/board/board-schema";
import { getPaddockBoard } from "@/lib/board/get-paddock-board";
import { clock } from "@/lib/clock";
import { idSchema } from "@/lib/http/id-schema";
import { boardKeys } from "@/lib/query/board-queries";
import { getQueryClient } from "@/lib/query/get-query-client";

export const metadata: Metadata = { title: "Paddock board" };

/** The public paddock board (no sign-in): the published run sheet, on track now, next to call
 *  and the one after, the day's changes, and where each car stands at the tech line. */
export default async function BoardPage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  if (!idSchema.safeParse(eventId).success) notFound();
  const board = await getPaddockBoard({ eventId, now: clock.now() }).catch(() => null);
  if (!board) notFound();
  const queryClient = getQueryClient();
  // Heard "at the server's read time": the browser asks again at once and learns its own offset.
  const snapshot: BoardSnapshot = {
    board,
    etag: boardEtag(board),
    heardAt: Date.parse(board.updatedAt),
    offsetMs: 0,
  };
  queryClient.setQueryData(boardKeys.event(eventId), snapshot);
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-baseline gap-x-4">
        <p className="text-base font-semibold uppercase tracking-wider text-accent 2xl:text-xl">
          Paddock board
        </p>
        <h1 className="text-3xl font-bold 2xl:text-4xl">{board.eventName}</h1>
      </div>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <PaddockBoard eventId={eventId} />
      </HydrationBoundary>
    </div>
  );
}
