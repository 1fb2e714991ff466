import "server-only";
import { and, desc, eq, gt, isNull } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import { clock } from "../../lib/clock";
import { AppError } from "../../lib/errors";
import { parseCompactJws } from "../../lib/passes/parse-compact-jws";
import { passBlockers } from "../../lib/passes/pass-blockers";
import { type PassClaims, passPayloadSchema } from "../../lib/passes/pass-claims-schema";
import { passValidityWindow } from "../../lib/passes/pass-expiry";
import { signPass } from "../../lib/passes/sign-pass";
import { getDb } from "../client";
import { auditLog, entries, eventPassKeys, passes } from "../schema";
import { ensureEventPassKey } from "./ensure-event-pass-key";
import { getEntryForPass } from "./get-entry-for-pass";

export type IssuedPass = {
  passId: string;
  /** The compact JWS. */
  token: string;
  claims: PassClaims;
  /** True when an existing pass was handed back rather than a new one signed. */
  reused: boolean;
};

/** The claims inside a token we stored ourselves; null if it does not read (such as a pass in an
 *  older layout, which is then superseded like any other). */
function storedClaims(token: string): PassClaims | null {
  const parsed = parseCompactJws(token);
  if (!parsed.ok) return null;
  try {
    const json: unknown = JSON.parse(new TextDecoder().decode(parsed.jws.payload));
    const claims = passPayloadSchema.safeParse(json);
    return claims.success ? claims.data : null;
  } catch {
    return null;
  }
}

/**
 * The entry's pass: its current one (not revoked, not expired, signed with a key still trusted,
 * and still naming the entry's car number and expiry) or a newly signed one. A current
 * pass whose details no longer match the entry is revoked as superseded in the same transaction,
 * so an old car number cannot keep verifying. The entry's row is locked meanwhile, so two page
 * loads at once make one pass, not two. Refuses (409) while the entry may not have a pass.
 * @param actorId who asked (for the audit log)
 * @param now the issuing clock reading (a parameter so tests can set it)
 */
export async function issuePass({
  entryId,
  actorId,
  now = clock.now(),
}: {
  entryId: string;
  actorId: string | null;
  now?: Date;
}): Promise<IssuedPass> {
  const entry = await getEntryForPass({ entryId });
  if (!entry) throw new AppError("not_found", "There is no such entry.");
  const window = passValidityWindow({
    issuedAt: now,
    eventDate: entry.eventDate,
    timeZone: entry.timeZone,
  });
  const [blocker] = passBlockers({ ...entry, eventOver: window.exp <= window.iat });
  if (blocker) throw new AppError("conflict", blocker);
  const key = await ensureEventPassKey({ eventId: entry.eventId });

  return getDb().transaction(async (tx) => {
    const [locked] = await tx
      .select({ carNumber: entries.carNumber })
      .from(entries)
      .where(eq(entries.id, entryId))
      .for("update");
    if (!locked) throw new AppError("not_found", "There is no such entry.");

    const current = await tx
      .select({ id: passes.id, token: passes.token })
      .from(passes)
      .innerJoin(eventPassKeys, eq(eventPassKeys.kid, passes.kid))
      .where(
        and(
          eq(passes.eventId, entry.eventId),
          eq(passes.entryId, entryId),
          isNull(passes.revokedAt),
          gt(passes.expiresAt, now),
          isNull(eventPassKeys.retiredAt),
        ),
      )
      .orderBy(desc(passes.issuedAt));
    for (const row of current) {
      const claims = storedClaims(row.token);
      if (
        claims &&
        claims.evt === entry.eventId &&
        claims.car === locked.carNumber &&
        claims.exp === window.exp
      ) {
        return { passId: row.id, token: row.token, claims, reused: true };
      }
      const reason = "Superseded: the entry's car number or date changed, or the pass layout did.";
      await tx
        .update(passes)
        .set({ revokedAt: now, revokedReason: reason, revokedBy: actorId })
        .where(eq(passes.id, row.id));
      await tx.insert(auditLog).values({
        eventId: entry.eventId,
        actorId,
        action: "pass.revoke",
        subjectType: "pass",
        subjectId: row.id,
        detail: { entryId, reason },
        createdAt: now,
      });
    }

    const passId = uuidv7();
    const claims: PassClaims = {
      evt: entry.eventId,
      ent: entryId,
      car: locked.carNumber,
      iat: window.iat,
      exp: window.exp,
      jti: passId,
    };
    const token = signPass({ claims, kid: key.kid, privateKeyPkcs8: key.privateKeyPkcs8 });
    await tx.insert(passes).values({
      id: passId,
      eventId: entry.eventId,
      entryId,
      kid: key.kid,
      token,
      issuedAt: new Date(window.iat * 1000),
      expiresAt: new Date(window.exp * 1000),
    });
    await tx.insert(auditLog).values({
      eventId: entry.eventId,
      actorId,
      action: "pass.issue",
      subjectType: "pass",
      subjectId: passId,
      detail: { entryId, kid: key.kid, carNumber: claims.car, expiresAt: claims.exp },
      createdAt: now,
    });
    return { passId, token, claims, reused: false };
  });
}
