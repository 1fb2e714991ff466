import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { clock } from "../../lib/clock";
import { AppError } from "../../lib/errors";
import { generateEventKey } from "../../lib/passes/generate-event-key";
import { type Db, getDb } from "../client";
import { auditLog, eventPassKeys, events } from "../schema";

/** The key an event signs passes with. Server only: it carries the private key. */
export type EventSigningKey = { kid: string; publicKeyX: string; privateKeyPkcs8: string };

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

async function currentKey(
  db: Db | Tx,
  eventId: string,
  lock: boolean,
): Promise<EventSigningKey | null> {
  const query = db
    .select({
      kid: eventPassKeys.kid,
      publicKeyX: eventPassKeys.publicKeyX,
      privateKeyPkcs8: eventPassKeys.privateKeyPkcs8,
    })
    .from(eventPassKeys)
    .where(and(eq(eventPassKeys.eventId, eventId), isNull(eventPassKeys.retiredAt)))
    .orderBy(desc(eventPassKeys.createdAt))
    .limit(1);
  const [row] = lock ? await query.for("update") : await query;
  return row ?? null;
}

/**
 * The event's current (newest, not retired) signing key, made on first use. Race-safe: two
 * requests making the first pass at once serialize on the event's row (SELECT … FOR UPDATE),
 * and the second finds the key the first made, so an event never gets two keys by accident.
 */
export async function ensureEventPassKey({
  eventId,
}: {
  eventId: string;
}): Promise<EventSigningKey> {
  const db = getDb();
  const existing = await currentKey(db, eventId, false);
  if (existing) return existing;
  return db.transaction(async (tx) => {
    const [event] = await tx
      .select({ id: events.id })
      .from(events)
      .where(eq(events.id, eventId))
      .for("update");
    if (!event) throw new AppError("not_found", "There is no such event.");
    // A locking read sees rows committed while we waited for the lock.
    const made = await currentKey(tx, eventId, true);
    if (made) return made;
    const key = generateEventKey();
    const now = clock.now();
    await tx.insert(eventPassKeys).values({ ...key, eventId, createdAt: now });
    await tx.insert(auditLog).values({
      eventId,
      actorId: null,
      action: "pass-key.create",
      subjectType: "event-pass-key",
      subjectId: key.kid,
      detail: { publicKeyX: key.publicKeyX },
      createdAt: now,
    });
    return key;
  });
}
