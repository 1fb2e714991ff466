import { createHash } from "node:crypto";
import type { Board } from "./board-schema";

/**
 * A strong ETag of what the board shows, leaving out the server's read time (which changes on
 * every request): the same cars, run sheet and calls give the same tag, so a screen that already
 * has them gets a 304 with no body.
 */
export function boardEtag(board: Board): string {
  const { updatedAt: _readAt, ...shown } = board;
  const digest = createHash("sha256").update(JSON.stringify(shown)).digest("base64url");
  return `"board-${digest.slice(0, 32)}"`;
}

/** Whether an If-None-Match header names this tag (a list, weak tags and `*` included). */
export function etagMatches(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  return ifNoneMatch
    .split(",")
    .map((tag) => tag.trim().replace(/^W\//, ""))
    .some((tag) => tag === "*" || tag === etag);
}
