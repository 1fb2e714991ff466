import { parseCompactJws } from "../passes/parse-compact-jws";
import { type PassClaims, passHeaderSchema, passPayloadSchema } from "../passes/pass-claims-schema";
import type { PassPublicKey } from "../passes/pass-public-key-schema";
import { verifyEd25519JwsSignature } from "../passes/verify-ed25519-jws-signature";

/** Why a pass was refused. */
export type PassRefusalCode =
  | "malformed"
  | "unknown-key"
  | "bad-signature"
  | "expired"
  | "not-yet-valid"
  | "revoked"
  | "other-event";

export type VerifyPassResult =
  | { ok: true; claims: PassClaims }
  | {
      ok: false;
      code: PassRefusalCode;
      /** A sentence a scrutineer can read aloud. */
      message: string;
      /** Present only when the signature was good (refused for time, revocation or event), so a
       *  screen may say which car it was; never present for a pass that failed its signature. */
      claims?: PassClaims;
      /** For logs and tests: what exactly was wrong. Not for the screen. */
      detail?: string;
    };

/** How far a phone's clock may run slow before a freshly issued pass reads "not valid yet",
 *  in seconds. */
export const defaultClockToleranceSeconds = 300;

export const passRefusalMessages: Record<PassRefusalCode, string> = {
  malformed:
    "This is not a Plumbline pass, or the code was not read completely. Scan again, or type the car number.",
  "unknown-key":
    "This phone does not know the key this pass was signed with. Refresh the event pack, then scan again.",
  "bad-signature": "This pass has been altered or was not issued by Plumbline.",
  expired: "This pass has expired.",
  "not-yet-valid": "This pass is not valid yet. Check this phone's date and time.",
  revoked: "This pass was revoked by the organizer.",
  "other-event": "This pass is for another event.",
};

function refuse(
  code: PassRefusalCode,
  extra: { claims?: PassClaims; detail?: string } = {},
): VerifyPassResult {
  return { ok: false, code, message: passRefusalMessages[code], ...extra };
}

/** Decode a payload as JSON without trusting it; null when it is not JSON. */
function readJson(bytes: Uint8Array): unknown {
  try {
    return JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
  } catch {
    return null;
  }
}

/**
 * Verify a scanned pass against one event's keys and revocations — on the scrutineer's phone
 * offline (keys and revocations from the event pack) and on the server (from the database), with
 * the same code. Order: shape, header, key, signature, then the claims (event, revocation,
 * validity window). Nothing from the token is believed until its signature checks out.
 * @param token the compact JWS (see extractPassToken for scanned text)
 * @param eventId the event this tech line is scrutineering
 * @param keys the event's public keys (kid + x)
 * @param revokedPassIds pass ids (jti) the organizer revoked
 * @param now the clock reading to judge expiry by (a parameter: this code never reads the clock)
 * @param clockToleranceSeconds allowance for a slow clock on the start of validity, seconds
 */
export async function verifyPass({
  token,
  eventId,
  keys,
  revokedPassIds,
  now,
  clockToleranceSeconds = defaultClockToleranceSeconds,
}: {
  token: string;
  eventId: string;
  keys: readonly PassPublicKey[];
  revokedPassIds: readonly string[];
  now: Date;
  clockToleranceSeconds?: number;
}): Promise<VerifyPassResult> {
  const parsed = parseCompactJws(token);
  if (!parsed.ok) return refuse("malformed", { detail: parsed.reason });
  const { jws } = parsed;

  const header = passHeaderSchema.safeParse(jws.header);
  if (!header.success) return refuse("malformed", { detail: "header is not a pass header" });

  const key = keys.find((k) => k.kid === header.data.kid);
  if (!key) {
    // Most often a pass from another event (its key is not in this event's pack). The payload is
    // unverified here, so it can only pick which refusal to show, never turn one into a pass.
    const unverified = passPayloadSchema.safeParse(readJson(jws.payload));
    if (unverified.success && unverified.data.evt !== eventId) {
      return refuse("other-event", { detail: "unknown key; payload names another event" });
    }
    return refuse("unknown-key", { detail: `no key ${header.data.kid}` });
  }

  const signed = await verifyEd25519JwsSignature({
    signingInput: jws.signingInput,
    signature: jws.signature,
    publicKeyX: key.x,
  });
  if (!signed) return refuse("bad-signature");

  const claims = passPayloadSchema.safeParse(readJson(jws.payload));
  if (!claims.success) return refuse("malformed", { detail: "payload is not pass claims" });
  const c = claims.data;

  if (c.evt !== eventId) return refuse("other-event", { claims: c });
  if (revokedPassIds.includes(c.jti)) return refuse("revoked", { claims: c });
  const nowSeconds = Math.floor(now.getTime() / 1000);
  if (nowSeconds >= c.exp) return refuse("expired", { claims: c });
  if (nowSeconds + clockToleranceSeconds < c.iat) {
    return refuse("not-yet-valid", { claims: c });
  }
  return { ok: true, claims: c };
}
