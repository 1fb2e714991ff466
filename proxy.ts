import { type NextRequest, NextResponse } from "next/server";
import NextAuth from "next-auth";
import { authConfig } from "./auth.config";
import { env } from "./lib/env";
import { actionBodyLimit } from "./lib/http/action-body-limit";
import { describeBytes } from "./lib/http/body-limits";
import { contentSecurityPolicy } from "./lib/http/content-security-policy";

const { auth } = NextAuth(authConfig);
const https = env.APP_URL.startsWith("https:");

/** A server action's body over its page's limit is refused before Next reads it. */
function refuseLargeAction(request: NextRequest): Response | null {
  if (request.method !== "POST" || !request.headers.has("next-action")) return null;
  const limit = actionBodyLimit(request.nextUrl.pathname);
  const length = request.headers.get("content-length");
  if (length !== null && /^\d+$/.test(length) && Number(length) <= limit) return null;
  return new Response(`That form sends more than this page takes (${describeBytes(limit)}).`, {
    status: length === null ? 411 : 413,
    headers: { "content-type": "text/plain; charset=utf-8" },
  });
}

// Every page request: server-action bodies capped by page; the optimistic redirect to sign-in
// for signed-in areas (pages, handlers and actions still check permissions themselves); and a
// content security policy with a fresh nonce, which Next puts on its own scripts.
export const proxy = auth(async (request) => {
  const tooLarge = refuseLargeAction(request);
  if (tooLarge) return tooLarge;
  const allowed = authConfig.callbacks.authorized({ auth: request.auth, request });
  if (!allowed) {
    // Built on the configured origin, never on a request header, with the path to come back to.
    const signIn = new URL("/sign-in", env.APP_URL);
    signIn.searchParams.set("callbackUrl", `${request.nextUrl.pathname}${request.nextUrl.search}`);
    return NextResponse.redirect(signIn);
  }
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const policy = contentSecurityPolicy({ nonce, https });
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("content-security-policy", policy);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("content-security-policy", policy);
  return response;
});

export const config = {
  matcher: [
    "/((?!api|_next/static|_next/image|sw.js|swe-worker|manifest.webmanifest|icons|favicon).*)",
  ],
};
