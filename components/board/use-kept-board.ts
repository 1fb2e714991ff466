"use client";
import { useQueryClient } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import type { BoardSnapshot } from "@/lib/board/board-schema";
import { loadBoardSnapshot, saveBoardSnapshot } from "@/lib/offline/board-snapshot";
import { keepPageForOffline } from "@/lib/offline/keep-page-for-offline";
import { boardKeys } from "@/lib/query/board-queries";

const readAt = (s: BoardSnapshot) => Date.parse(s.board.updatedAt);

/**
 * Keeps the last board this screen heard in IndexedDB and brings it back on a reload: a page
 * the service worker served from its cache with no signal carries the board as it was when the
 * page was saved, and the kept copy is often newer. The newer of the two (by the server's read
 * time) is shown. Every answer after that is kept.
 */
export function useKeptBoard(eventId: string, data: BoardSnapshot | undefined): void {
  const client = useQueryClient();
  const [loaded, setLoaded] = useState(false);
  useEffect(() => {
    let live = true;
    void loadBoardSnapshot(eventId).then((kept) => {
      if (!live) return;
      const current = client.getQueryData<BoardSnapshot>(boardKeys.event(eventId));
      if (kept && (!current || readAt(kept) > readAt(current)))
        client.setQueryData(boardKeys.event(eventId), kept);
      setLoaded(true);
    });
    return () => {
      live = false;
    };
  }, [client, eventId]);
  useEffect(() => {
    if (loaded && data) void saveBoardSnapshot(eventId, data).catch(() => undefined);
  }, [loaded, data, eventId]);
  // The board's own page, kept for a reload with no signal from the first visit on.
  useEffect(() => {
    void keepPageForOffline(`/board/${eventId}`).catch(() => undefined);
  }, [eventId]);
}
