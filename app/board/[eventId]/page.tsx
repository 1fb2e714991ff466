import "@fontsource/barlow-semi-condensed/700.css";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PaddockBoard } from "@/components/paddock-board";
import { getPaddockBoard } from "@/lib/board/get-paddock-board";
import { clock } from "@/lib/clock";
import { idSchema } from "@/lib/http/id-schema";
import { boardKeys } from "@/lib/query/board-queries";
import { getQueryClient } from "@/lib/query/get-query-client";

export const metadata: Metadata = { title: "Paddock board" };

/** The public paddock board: where each car stands at the tech line (cleared, moved up, held or
 *  still waiting). Tech state only: whether a car runs is the run sheet's to say. */
export default async function BoardPage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  if (!idSchema.safeParse(eventId).success) notFound();
  const board = await getPaddockBoard({ eventId, now: clock.now() }).catch(() => null);
  if (!board) notFound();
  const queryClient = getQueryClient();
  queryClient.setQueryData(boardKeys.event(eventId), board);
  return (
    <div className="space-y-4">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">
          Paddock board
        </p>
        <h1 className="text-3xl font-bold">{board.eventName}</h1>
        <p className="text-base" data-testid="board-scope">
          Scrutineering only: “Cleared” means the car passed the tech line, not that it is ready to
          run. A car also needs to be signed on (waiver and fee) before the clerk of course puts it
          in a run group; the run sheet says who runs. The chief scrutineer has the final say.
        </p>
      </div>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <PaddockBoard eventId={eventId} />
      </HydrationBoundary>
    </div>
  );
}
