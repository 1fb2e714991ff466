import { z } from "zod";

// Source: ITU-T E.164 §6 — an international number has at most 15 digits. A national number with
// its trunk prefix (a leading 0) stays within that too.
const MAX_DIGITS = 15;
const MIN_DIGITS = 6;

/** A phone number as typed ("+44 7700 900123", "07700 900123"): digits with spaces, dots, dashes,
 *  brackets and one leading +; kept as typed (trimmed), checked by its count of digits. */
export function phoneSchema(what: string) {
  const message = `Enter ${what} with its area or mobile code, e.g. 07700 900123 or +44 7700 900123`;
  return z
    .string({ error: message })
    .trim()
    .max(40, message)
    .refine((v) => /^\+?[0-9 ().-]+$/.test(v), message)
    .refine((v) => {
      const digits = v.replace(/\D/g, "").length;
      return digits >= MIN_DIGITS && digits <= MAX_DIGITS;
    }, message);
}

/** The digits of a phone number, for comparing two numbers however they were spaced. */
export function phoneDigits(value: string): string {
  return value.replace(/\D/g, "").replace(/^0+/, "");
}
