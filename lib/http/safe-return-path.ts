/** Accept only a same-site path ("/tech/…"); anything else becomes the fallback. */
export function safeReturnPath(value: unknown, fallback = "/home"): string {
  if (typeof value !== "string") return fallback;
  if (!value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return fallback;
  return value;
}
