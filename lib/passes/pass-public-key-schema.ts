import { z } from "zod";

/**
 * One public key of an event as the event pack carries it: the key id that pass headers name,
 * and `x`, the raw 32-byte Ed25519 public key in base64url (the JWK "x" member, RFC 8037 §2).
 */
export const passPublicKeySchema = z.object({
  kid: z.string().min(1).max(64),
  x: z.string().regex(/^[A-Za-z0-9_-]{43}$/, "An Ed25519 public key is 43 base64url characters"),
});

export type PassPublicKey = z.infer<typeof passPublicKeySchema>;

/** What the phone needs to verify passes offline: the event's keys and its revoked pass ids. */
export const passVerificationMaterialSchema = z.object({
  keys: z.array(passPublicKeySchema),
  revokedPassIds: z.array(z.uuid()),
});

export type PassVerificationMaterial = z.infer<typeof passVerificationMaterialSchema>;
