import { queryOptions } from "@tanstack/react-query";
import type { ClerkView } from "../run-sheet/clerk-view";
import { fetchJson } from "./fetch-json";

export const runGroupKeys = {
  all: ["run-groups"] as const,
  clerkView: (eventId: string) => [...runGroupKeys.all, "clerk", eventId] as const,
};

/** The clerk of course's view of the event (cars, drives, draft, run sheets, session marks).
 *  Refetched every 20 s, so a second desk's save or a held car shows up without a reload. */
export const clerkViewQuery = (eventId: string) =>
  queryOptions({
    queryKey: runGroupKeys.clerkView(eventId),
    queryFn: () => fetchJson<ClerkView>(`/api/events/${eventId}/run-groups`),
    refetchInterval: 20_000,
    refetchOnWindowFocus: true,
  });
