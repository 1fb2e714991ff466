/**
 * The content security policy of Plumbline's pages. Scripts run only with this response's nonce
 * (Next puts it on its own scripts) or when loaded by such a script ('strict-dynamic': the camera
 * scanner's chunk); styles come from the app's own stylesheets, and inline style attributes stay
 * allowed because React and the scanner set widths and positions with them (no script runs from a
 * style). Photos and the pass QR are blob: and data: images; the service worker comes from the
 * app itself; no page may be framed, no plugin runs, forms post only to the app.
 */
export function contentSecurityPolicy({ nonce, https }: { nonce: string; https: boolean }): string {
  const directives = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "media-src 'self' blob:",
    "worker-src 'self'",
    "manifest-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ];
  if (https) directives.push("upgrade-insecure-requests");
  return directives.join("; ");
}

/** The policy of everything that is not a page (JSON, CSV, photos): nothing may run or frame it. */
export const NON_PAGE_CSP = "default-src 'none'; frame-ancestors 'none'; sandbox";

/** The service worker script's own policy: it fetches from the app and nothing else. */
export const SERVICE_WORKER_CSP =
  "default-src 'self'; script-src 'self'; connect-src 'self'; frame-ancestors 'none'";
