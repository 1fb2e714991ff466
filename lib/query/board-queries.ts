import { queryOptions } from "@tanstack/react-query";
import type { BoardSnapshot } from "../board/board-schema";
import { fetchBoard } from "../board/fetch-board";

export const boardKeys = {
  all: ["board"] as const,
  event: (eventId: string) => [...boardKeys.all, eventId] as const,
};

/** How often a screen asks for the board. 5 s: a clerk's call or a new verdict reaches the
 *  paddock before anyone has walked to the dummy grid, and an unchanged board costs a 304 with no
 *  body, so a few dozen phones and TVs make a few requests a second at most. */
export const BOARD_REFETCH_MS = 5_000;

/** The paddock board: every 5 s while the screen is shown, on focus and on reconnect; with the
 *  previous answer's ETag, so an unchanged board is a 304. */
export const boardQuery = (eventId: string) =>
  queryOptions({
    queryKey: boardKeys.event(eventId),
    queryFn: ({ client, queryKey, signal }) =>
      fetchBoard({ eventId, previous: client.getQueryData<BoardSnapshot>(queryKey), signal }),
    refetchInterval: BOARD_REFETCH_MS,
    refetchOnWindowFocus: true,
    refetchOnReconnect: true,
    staleTime: 0,
    retry: false,
  });
