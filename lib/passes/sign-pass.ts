import "server-only";
import { createPrivateKey } from "node:crypto";
import { type PassClaims, passClaimsSchema, passTokenType } from "./pass-claims-schema";
import { signCompactJws } from "./sign-compact-jws";
import { toPassPayload } from "./to-pass-payload";

/**
 * Sign a pass: the claims (checked against the pass schema first, so we never issue a pass our
 * own verifier would call malformed), written compactly (`toPassPayload`), under the header
 * `{ alg: "EdDSA", kid, typ }`.
 * @param privateKeyPkcs8 the event's private key, PKCS #8 DER in base64 (as event_pass_keys holds it)
 */
export function signPass({
  claims,
  kid,
  privateKeyPkcs8,
}: {
  claims: PassClaims;
  kid: string;
  privateKeyPkcs8: string;
}): string {
  const checked = passClaimsSchema.parse(claims);
  const privateKey = createPrivateKey({
    key: Buffer.from(privateKeyPkcs8, "base64"),
    format: "der",
    type: "pkcs8",
  });
  return signCompactJws({
    protectedHeader: { alg: "EdDSA", kid, typ: passTokenType },
    payload: new TextEncoder().encode(JSON.stringify(toPassPayload(checked))),
    privateKey,
  });
}
