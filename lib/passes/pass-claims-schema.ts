import { z } from "zod";

/** The JWS `typ` of a Plumbline pass (RFC 7515 §4.1.9; RFC 8725 §3.11 explicit typing), so a
 *  token signed for some other purpose can never be taken for a pass. */
export const passTokenType = "plumbline-pass+jwt";

/** The `iss` of every pass. */
export const passIssuer = "plumbline";

/** A NumericDate (RFC 7519 §2): whole seconds since 1970-01-01T00:00:00Z. We only ever issue
 *  whole seconds, so anything else did not come from us. */
const numericDateSeconds = z
  .number()
  .int("A pass time must be whole seconds")
  .min(0)
  .max(253_402_300_799, "A pass time must be before the year 10000");

const id = z.uuid({ message: "Not a valid id" });

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

/**
 * The payload of a pass: which event, which entry, the car number and declared class the car
 * was entered with, and the window in which the pass is good. It identifies an entry; it says
 * nothing about whether the car is safe or legal.
 */
export const passClaimsSchema = z
  .object({
    iss: z.literal(passIssuer),
    /** Event id. */
    evt: id,
    /** Entry id. */
    ent: id,
    /** Car number on the entry. */
    car: z.number().int().min(0).max(9999),
    /** Declared class id from the event's rule set. */
    cls: z.string().min(1).max(40),
    /** Issued at, NumericDate seconds. */
    iat: numericDateSeconds,
    /** Not before, NumericDate seconds (absent: valid from `iat`). */
    nbf: numericDateSeconds.optional(),
    /** Expires at, NumericDate seconds. */
    exp: numericDateSeconds,
    /** Pass id: what a revocation names. */
    jti: id,
  })
  .refine((c) => c.exp > c.iat, { message: "A pass must expire after it is issued", path: ["exp"] })
  .refine((c) => c.nbf === undefined || c.nbf < c.exp, {
    message: "A pass must start before it expires",
    path: ["nbf"],
  });

export type PassClaims = z.infer<typeof passClaimsSchema>;
