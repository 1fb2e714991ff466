import { generateKeyPairSync, sign } from "node:crypto";
import { passTokenType } from "../../lib/passes/pass-claims-schema";
import { toPassPayload } from "../../lib/passes/to-pass-payload";

const b64url = (data: Buffer | string) => Buffer.from(data).toString("base64url");

/**
 * A pass-shaped token for a real event and entry, in the pass layout, signed with a key the event
 * never issued — what a forger could make. The tech line must refuse it offline.
 */
export function forgePass(opts: {
  eventId: string;
  entryId: string;
  carNumber: number;
  kid: string;
}): string {
  const { privateKey } = generateKeyPairSync("ed25519");
  const now = Math.floor(Date.now() / 1000);
  const header = b64url(JSON.stringify({ alg: "EdDSA", kid: opts.kid, typ: passTokenType }));
  const payload = b64url(
    JSON.stringify(
      toPassPayload({
        evt: opts.eventId,
        ent: opts.entryId,
        car: opts.carNumber,
        iat: now,
        exp: now + 86_400,
        jti: "0190f0a0-0000-7000-8000-00000000f0f0",
      }),
    ),
  );
  const signature = sign(null, Buffer.from(`${header}.${payload}`), privateKey);
  return `${header}.${payload}.${b64url(signature)}`;
}
