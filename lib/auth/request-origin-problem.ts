import { env } from "@/lib/env";

/**
 * Why a server action must not start a sign-in from this request, or null when it may.
 * Auth.js's signIn() builds the mailed link and the redirect from the request's
 * X-Forwarded-Host (else Host) and X-Forwarded-Proto, which Next.js fills from the connection
 * when the request has none, and which the client can otherwise choose. So they must name
 * APP_URL exactly (an allow-list of one): a request for another host or scheme is refused and
 * nothing is sent. (AUTH_URL would pin the origin for signIn(), but next-auth then turns every
 * route-handler request into a NextRequest, which rewrites 127.0.0.1 to `localhost`.)
 */
export function requestOriginProblem(headers: Headers, appUrl = env.APP_URL): string | null {
  const app = new URL(appUrl);
  const host = (headers.get("x-forwarded-host") ?? headers.get("host") ?? "").trim().toLowerCase();
  const proto = (headers.get("x-forwarded-proto") ?? app.protocol.replace(":", ""))
    .trim()
    .toLowerCase();
  if (host === app.host && `${proto}:` === app.protocol) return null;
  return `Sign in at ${app.origin}: this server does not send sign-in links for other addresses.`;
}
