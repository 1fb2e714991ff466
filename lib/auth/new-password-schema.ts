import { z } from "zod";

// Source: NIST SP 800-63B §5.1.1.2 — memorized secrets chosen by the person are at least
// 8 characters; no composition rules.
export const NEW_PASSWORD_MIN = 8;
// bcrypt (lib/auth/password.ts) reads only the first 72 bytes of a password (Provos & Mazières,
// "A Future-Adaptable Password Scheme", 1999: the key is at most 72 bytes); a longer one would
// be cut silently, so it is refused instead. Sign-in accepts up to 200 characters, which covers it.
export const NEW_PASSWORD_MAX_BYTES = 72;

/** A password a person chooses for a new account. */
export const newPasswordSchema = z
  .string({ error: "Choose a password" })
  .min(NEW_PASSWORD_MIN, `Use at least ${NEW_PASSWORD_MIN} characters`)
  .refine(
    (v) => new TextEncoder().encode(v).length <= NEW_PASSWORD_MAX_BYTES,
    `Keep the password to ${NEW_PASSWORD_MAX_BYTES} bytes (about ${NEW_PASSWORD_MAX_BYTES} letters or digits)`,
  );
