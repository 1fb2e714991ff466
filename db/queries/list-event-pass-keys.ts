import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import type { PassPublicKey } from "../../lib/passes/pass-public-key-schema";
import { getDb } from "../client";
import { eventPassKeys } from "../schema";

/**
 * The event's trusted public keys (kid + x), oldest first, for the event pack and the server's
 * own checks. A retired key is left out, so every pass it signed is refused ("unknown key").
 */
export async function listEventPassKeys({
  eventId,
}: {
  eventId: string;
}): Promise<PassPublicKey[]> {
  return getDb()
    .select({ kid: eventPassKeys.kid, x: eventPassKeys.publicKeyX })
    .from(eventPassKeys)
    .where(and(eq(eventPassKeys.eventId, eventId), isNull(eventPassKeys.retiredAt)))
    .orderBy(asc(eventPassKeys.createdAt));
}
