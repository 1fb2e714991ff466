import { z } from "zod";
import { base64UrlToUuid } from "./base64url-to-uuid";

/** The JWS `typ` of a Plumbline pass (RFC 7515 §4.1.9, where the "application/" prefix may be
 *  left out; RFC 8725 §3.11 explicit typing), so a token signed for some other purpose can never
 *  be taken for a pass. Short because every character is in the QR. */
export const passTokenType = "plpass+jwt";

/** A NumericDate (RFC 7519 §2): whole seconds since 1970-01-01T00:00:00Z. We only ever issue
 *  whole seconds, so anything else did not come from us. */
const numericDateSeconds = z
  .number()
  .int("A pass time must be whole seconds")
  .min(0)
  .max(253_402_300_799, "A pass time must be before the year 10000");

const id = z.uuid({ message: "Not a valid id" });

/** An id as a pass carries it: the UUID's 16 bytes in 22 base64url characters, read back into
 *  the UUID's text form. Only the canonical encoding is accepted. */
const compactId = z
  .string()
  .length(22, "A pass id is 22 base64url characters")
  .refine((text) => base64UrlToUuid(text) !== null, "Not a valid id")
  .transform((text) => base64UrlToUuid(text) ?? "");

/**
 * The protected header of a pass (RFC 7515 §4; alg "EdDSA" per RFC 8037 §3.1). Strict: we issue
 * exactly these three members, and a `crit` or anything else we do not understand must fail
 * (RFC 7515 §4.1.11), never be ignored.
 */
export const passHeaderSchema = z.strictObject({
  alg: z.literal("EdDSA"),
  kid: z.string().min(1).max(64),
  typ: z.literal(passTokenType),
});

export type PassHeader = z.infer<typeof passHeaderSchema>;

const carNumber = z.number().int().min(0).max(9999);

/**
 * A pass as the code uses it: which event, which entry, the car number on the entry, when it was
 * issued and until when it is good, and its own id. It identifies an entry; it says nothing about
 * the car's class, whether it is safe or legal, or whether it may run.
 */
export const passClaimsSchema = z
  .object({
    /** Event id. */
    evt: id,
    /** Entry id. */
    ent: id,
    /** Car number on the entry. */
    car: carNumber,
    /** Issued at, NumericDate seconds; the pass is good from then. */
    iat: numericDateSeconds,
    /** Expires at, NumericDate seconds. */
    exp: numericDateSeconds,
    /** Pass id: what a revocation names. */
    jti: id,
  })
  .refine((c) => c.exp > c.iat, {
    message: "A pass must expire after it is issued",
    path: ["exp"],
  });

export type PassClaims = z.infer<typeof passClaimsSchema>;

/**
 * The JWS payload of a pass (a JWT claims set, RFC 7519), as compact as it can be while staying
 * plain JSON: the same members as PassClaims, with the three ids as 22-character base64url. The
 * issuer and class are not carried: the key (`kid`) says who signed it, and the entry says its
 * class. Parsing gives PassClaims back, with the ids in their UUID text form.
 */
export const passPayloadSchema = z
  .object({
    evt: compactId,
    ent: compactId,
    car: carNumber,
    iat: numericDateSeconds,
    exp: numericDateSeconds,
    jti: compactId,
  })
  .refine((c) => c.exp > c.iat, {
    message: "A pass must expire after it is issued",
    path: ["exp"],
  });

/** The payload exactly as it is signed (ids compact). */
export type PassPayload = z.input<typeof passPayloadSchema>;
