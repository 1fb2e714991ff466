import { queryOptions } from "@tanstack/react-query";
import type { Board } from "../board/board-schema";
import { fetchJson } from "./fetch-json";

export const boardKeys = {
  all: ["board"] as const,
  event: (eventId: string) => [...boardKeys.all, eventId] as const,
};

/** The paddock board, refetched every 15 s and when the screen comes back into view. */
export const boardQuery = (eventId: string) =>
  queryOptions({
    queryKey: boardKeys.event(eventId),
    queryFn: () => fetchJson<Board>(`/api/events/${eventId}/board`),
    refetchInterval: 15_000,
    refetchOnWindowFocus: true,
  });
