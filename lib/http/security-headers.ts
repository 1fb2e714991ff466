/**
 * Headers every response carries, pages, route handlers, the service worker and static files
 * alike: no MIME sniffing, no framing (also said by each CSP's frame-ancestors), the referrer
 * only to the app itself, the camera for the app itself only (the tech line's pass scanner) and
 * nothing else; HSTS when the app is served over HTTPS.
 */
export function securityHeaders({ https }: { https: boolean }): Record<string, string> {
  const headers: Record<string, string> = {
    "X-Content-Type-Options": "nosniff",
    "X-Frame-Options": "DENY",
    "Referrer-Policy": "strict-origin-when-cross-origin",
    "Permissions-Policy": "camera=(self), microphone=(), geolocation=(), payment=(), usb=()",
    "Cross-Origin-Opener-Policy": "same-origin",
  };
  if (https) headers["Strict-Transport-Security"] = "max-age=31536000; includeSubDomains";
  return headers;
}
