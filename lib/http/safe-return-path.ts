const BASE = "http://plumbline.invalid";

/**
 * Accept only a same-site path ("/tech/…"); anything else becomes the fallback. The value is
 * parsed the way a browser would (which drops tabs and newlines and reads `\` as `/`), so
 * `/\t/evil.test` or `/\evil.test` cannot turn into a link to another site.
 */
export function safeReturnPath(value: unknown, fallback = "/home"): string {
  if (typeof value !== "string" || value.length > 2000) return fallback;
  if (!value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return fallback;
  let url: URL;
  try {
    url = new URL(value, BASE);
  } catch {
    return fallback;
  }
  if (url.origin !== BASE) return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}
