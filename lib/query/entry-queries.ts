import { queryOptions } from "@tanstack/react-query";
import type { EntryResult } from "../entries/entry-result";
import { fetchJson } from "./fetch-json";

export const entryKeys = {
  all: ["entries"] as const,
  result: (entryId: string) => [...entryKeys.all, entryId, "result"] as const,
};

/**
 * An entry's result, refreshed every 20 s so a verdict posted from the tech line shows up — every
 * 2 s while the server says it is re-deriving it, so the new verdict shows as soon as it is there.
 */
export const entryResultQuery = (entryId: string) =>
  queryOptions({
    queryKey: entryKeys.result(entryId),
    queryFn: () => fetchJson<EntryResult>(`/api/entries/${entryId}/verdict`),
    refetchInterval: (query) => (query.state.data?.recomputing ? 2_000 : 20_000),
    refetchOnWindowFocus: true,
  });
