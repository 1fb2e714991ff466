import { z } from "zod";

// The plausibility check runs on the ASCII form: a local part of letters, digits and . _ ' + -,
// a domain of labels with a top-level name of letters (zod's e-mail pattern).
const plausibleAddress = z.email().max(254);
// Characters that would make the domain part parse as something else than a host name.
const NOT_IN_A_DOMAIN = /[\s/\\?#%@:[\]]/;

/**
 * The one spelling of an e-mail address that Plumbline stores, compares, limits and mails to:
 * trimmed, lower-cased, an international domain name in its ASCII (punycode) form
 * (`brackenmöor.test` → `xn--brackenmor-…`, a different address from `brackenmoor.test`).
 * Returns null for anything that is not a plausible address. Every path that takes an address
 * (the Auth.js e-mail provider's normalizeIdentifier, the password form, the seed) goes through
 * here; the database compares the result byte for byte (utf8mb4_bin).
 */
export function normalizeEmail(raw: string): string | null {
  const trimmed = raw.trim().normalize("NFC");
  if (trimmed.length > 320) return null;
  const at = trimmed.lastIndexOf("@");
  if (at <= 0 || at === trimmed.length - 1) return null;
  const local = trimmed.slice(0, at).toLowerCase();
  const domainText = trimmed.slice(at + 1);
  if (local.length > 64 || NOT_IN_A_DOMAIN.test(domainText)) return null;
  let domain: string;
  try {
    // WHATWG URL host parsing: lower-cases and applies IDNA (UTS #46) to-ASCII.
    domain = new URL(`http://${domainText}`).hostname;
  } catch {
    return null;
  }
  const address = `${local}@${domain}`;
  return plausibleAddress.safeParse(address).success ? address : null;
}
