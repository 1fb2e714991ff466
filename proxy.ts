import { type NextRequest, NextResponse } from "next/server";
import NextAuth from "next-auth";
import { authConfig } from "./auth.config";
import { env } from "./lib/env";
import { actionBodyLimit } from "./lib/http/action-body-limit";
import { describeBytes } from "./lib/http/body-limits";
import { contentSecurityPolicy } from "./lib/http/content-security-policy";
import { jsonDepth } from "./lib/http/json-depth";
import { multipartHeadersProblem } from "./lib/http/multipart-headers-problem";

const { auth } = NextAuth(authConfig);
const https = env.APP_URL.startsWith("https:");

/** A server action's arguments (a form's state and the form) nest a few levels at most. */
const MAX_ACTION_ARGUMENT_DEPTH = 16;

function isActionArguments(text: string): boolean {
  if (jsonDepth(text) > MAX_ACTION_ARGUMENT_DEPTH) return false;
  try {
    return Array.isArray(JSON.parse(text));
  } catch {
    return false;
  }
}

const plain = (status: number, text: string) =>
  new Response(text, { status, headers: { "content-type": "text/plain; charset=utf-8" } });

/**
 * A POST to a page is a server action (with the Next-Action header from a page's script, or as a
 * plain form post without one): its body over the page's limit is refused before Next reads it,
 * and a form whose parts Next's parser could not read is refused as the client's mistake (400),
 * never answered 500.
 */
async function refuseBadAction(request: NextRequest): Promise<Response | null> {
  if (request.method !== "POST") return null;
  const limit = actionBodyLimit(request.nextUrl.pathname);
  const length = request.headers.get("content-length");
  if (length === null || !/^\d+$/.test(length) || Number(length) > limit) {
    return plain(
      length === null ? 411 : 413,
      `That form sends more than this page takes (${describeBytes(limit)}).`,
    );
  }
  const type = request.headers.get("content-type") ?? "";
  if (/^multipart\/form-data/i.test(type)) {
    const problem = multipartHeadersProblem(await request.clone().text(), type);
    if (problem !== null) return plain(400, problem);
    if (!request.headers.has("next-action")) return null;
    // From a page's script the arguments are the form's fields plus part "0", the arguments
    // themselves as a JSON array (React's encodeReply); without it Next's decoder fails with 500.
    const form = await request
      .clone()
      .formData()
      .catch(() => null);
    const root = form?.get("0");
    return typeof root === "string" && isActionArguments(root)
      ? null
      : plain(400, "The form could not be read; send it again.");
  }
  // A page's script sends an action's arguments that hold no form as a JSON array (React's
  // encodeReply); anything else would fail inside Next's decoder as a 500.
  if (request.headers.has("next-action") && !isActionArguments(await request.clone().text())) {
    return plain(400, "The form could not be read; send it again.");
  }
  return null;
}

// Every page request: server-action bodies capped by page; the optimistic redirect to sign-in
// for signed-in areas (pages, handlers and actions still check permissions themselves); and a
// content security policy with a fresh nonce, which Next puts on its own scripts.
export const proxy = auth(async (request) => {
  const refused = await refuseBadAction(request);
  if (refused) return refused;
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
    // Everything but route handlers, Next's own files, the service worker, manifest and icons
    // (each with its slash or full name, so a page such as /apiary still gets its CSP).
    "/((?!api/|_next/static/|_next/image/|sw\\.js|swe-worker-|manifest\\.webmanifest|icons/|favicon\\.ico).*)",
  ],
};
