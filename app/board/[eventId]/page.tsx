import "@fontsource/barlow-semi-condensed/700.css";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { TechBoard } from "@/components/tech-board";
import { getTechBoard } from "@/lib/board/get-tech-board";
import { idSchema } from "@/lib/http/id-schema";
import { boardKeys } from "@/lib/query/board-queries";
import { getQueryClient } from "@/lib/query/get-query-client";

export const metadata: Metadata = { title: "Tech board" };

/** The public tech board: which cars are cleared, moved up, held or still waiting. */
export default async function BoardPage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  if (!idSchema.safeParse(eventId).success) notFound();
  const board = await getTechBoard({ eventId, now: new Date() }).catch(() => null);
  if (!board) notFound();
  const queryClient = getQueryClient();
  queryClient.setQueryData(boardKeys.event(eventId), board);
  return (
    <div className="space-y-4">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">Tech board</p>
        <h1 className="text-3xl font-bold">{board.eventName}</h1>
        <p className="text-base">
          Only cleared and moved-up cars may go into run groups. The chief scrutineer has the final
          say.
        </p>
      </div>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <TechBoard eventId={eventId} />
      </HydrationBoundary>
    </div>
  );
}
