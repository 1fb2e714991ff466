import type { NextRequest } from "next/server";
import { handlers } from "@/auth";

// GET/POST /api/auth/* — Auth.js sign-in, callback, session and sign-out endpoints.
// Next's route handlers report `localhost` as the request's host whatever the browser asked for,
// so Auth.js would build sign-in links and redirects for another origin than the browser's (and
// the session cookie would land on the wrong host). Hand Auth.js a request carrying the host the
// browser used. (Leave AUTH_URL unset: with trustHost, the Host header decides.)
function withBrowserHost(handler: (request: NextRequest) => Promise<Response>) {
  return async (request: NextRequest) => {
    const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host");
    if (!host) return handler(request);
    const url = new URL(request.url);
    url.host = host;
    const body = request.method === "POST" ? await request.text() : undefined;
    const rewritten = new Request(url, { method: request.method, headers: request.headers, body });
    return handler(rewritten as NextRequest);
  };
}

export const GET = withBrowserHost(handlers.GET);
export const POST = withBrowserHost(handlers.POST);
