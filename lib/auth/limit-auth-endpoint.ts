import "server-only";
import type { NextRequest } from "next/server";
import { env } from "@/lib/env";
import { clientAddress } from "./client-address";
import { normalizeEmail } from "./normalize-email";
import { forgivePasswordAttempt, type SignInLimitKind, takeSignInAttempt } from "./sign-in-limits";

type AuthHandler = (request: NextRequest) => Promise<Response>;

/**
 * Hand Auth.js the request at APP_URL's origin: it builds the mailed link, every redirect and
 * the cookie settings from the request's URL. The Host and X-Forwarded-Host headers are the
 * client's to choose, and Next's route handlers report `localhost` whatever the browser asked
 * for. A plain Request, because a NextRequest would turn 127.0.0.1 back into `localhost`.
 */
export function atAppOrigin(handler: AuthHandler): AuthHandler {
  return async (request) => {
    const { pathname, search } = new URL(request.url);
    const body = request.method === "POST" ? await request.text() : undefined;
    const atOrigin = new Request(`${new URL(env.APP_URL).origin}${pathname}${search}`, {
      method: request.method,
      headers: request.headers,
      body,
    });
    // next-auth's handlers only read `nextUrl` when AUTH_URL is set, which Plumbline never sets.
    return handler(atOrigin as NextRequest);
  };
}

/** Which Auth.js POSTs try a password or send a sign-in e-mail. */
function limitKind(pathname: string): SignInLimitKind | null {
  if (pathname.endsWith("/callback/credentials")) return "password";
  if (pathname.endsWith("/signin/nodemailer")) return "link";
  return null;
}

/**
 * The address Auth.js will act on, read the way it reads it (the body's fields as an object, so
 * the last of a repeated field wins), or null when the body names more than one address: a
 * limit counted on one address while Auth.js signs in as another would limit nothing.
 */
function readEmail(request: Request, body: string): string | null {
  const type = request.headers.get("content-type") ?? "";
  if (type.includes("application/json")) {
    try {
      const parsed: unknown = JSON.parse(body);
      if (parsed && typeof parsed === "object" && "email" in parsed) {
        return typeof parsed.email === "string" ? parsed.email : "";
      }
    } catch {
      return "";
    }
    return "";
  }
  const fields = new URLSearchParams(body);
  if (fields.getAll("email").length > 1) return null;
  return Object.fromEntries(fields).email ?? "";
}

function hasSessionCookie(response: Response): boolean {
  return response.headers
    .getSetCookie()
    .some((line) => /^(__Secure-)?authjs\.session-token=[^;]/.test(line));
}

/**
 * Put the sign-in limits (sign-in-limits.ts) in front of Auth.js's own POST endpoints: a
 * password tried at /api/auth/callback/credentials and a link asked for at
 * /api/auth/signin/nodemailer count before Auth.js sees them; over the limit the answer is 429
 * with Retry-After and the words to show. A password that signs in gives its attempt back.
 * (The sign-in form's server actions call the same limits themselves.)
 */
export function withSignInLimits(handler: AuthHandler): AuthHandler {
  return async (request) => {
    const kind = limitKind(request.nextUrl.pathname);
    if (!kind) return handler(request);
    const body = await request.text();
    const email = readEmail(request, body);
    if (email === null) {
      return Response.json(
        { error: { code: "invalid_input", message: "Send one e-mail address." } },
        { status: 400 },
      );
    }
    const who = { email: normalizeEmail(email), clientAddress: clientAddress(request.headers) };
    const limit = await takeSignInAttempt(kind, who);
    if (!limit.ok) {
      return Response.json(
        { error: { code: "rate_limited", message: limit.message } },
        { status: 429, headers: { "Retry-After": String(limit.retryAfterSeconds) } },
      );
    }
    const again = new Request(request.url, { method: "POST", headers: request.headers, body });
    const response = await handler(again as NextRequest);
    if (kind === "password" && hasSessionCookie(response)) await forgivePasswordAttempt(who);
    return response;
  };
}
