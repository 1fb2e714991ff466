// Shared fixtures for the pass tests: invented ids and a fresh key pair per call. Invented data,
// never an expected value for a trade fact.
import { generateEventKey } from "@/lib/passes/generate-event-key";
import type { PassClaims } from "@/lib/passes/pass-claims-schema";
import { signPass } from "@/lib/passes/sign-pass";

export const eventId = "0193a4b2-1c00-7000-8000-000000000001";
export const otherEventId = "0193a4b2-1c00-7000-8000-000000000002";
export const entryId = "0193a4b2-1c00-7000-8000-0000000000e1";
export const passId = "0193a4b2-1c00-7000-8000-0000000000a1";

/** 2027-04-17T08:00:00Z, a morning on the tech line (NumericDate seconds). */
export const issuedAtSeconds = Date.UTC(2027, 3, 17, 8) / 1000;

export function claimsFor(overrides: Partial<PassClaims> = {}): PassClaims {
  return {
    evt: eventId,
    ent: entryId,
    car: 7,
    iat: issuedAtSeconds,
    exp: issuedAtSeconds + 20 * 3600,
    jti: passId,
    ...overrides,
  };
}

/** A key pair and a signer for it, as the server holds them. */
export function makeEventKey() {
  const key = generateEventKey();
  return {
    ...key,
    publicKey: { kid: key.kid, x: key.publicKeyX },
    sign: (claims: PassClaims, kid = key.kid) =>
      signPass({ claims, kid, privateKeyPkcs8: key.privateKeyPkcs8 }),
  };
}

/** The same instant as a Date, offset by seconds. */
export function at(seconds: number): Date {
  return new Date(seconds * 1000);
}
