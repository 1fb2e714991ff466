import { NextRequest } from "next/server";
import { handlers } from "@/auth";
import { atAppOrigin, withSignInLimits } from "@/lib/auth/limit-auth-endpoint";
import { defineRoute } from "@/lib/http/define-route";

const getAuth = atAppOrigin(handlers.GET);
const postAuth = withSignInLimits(atAppOrigin(handlers.POST));
const access = { public: "Auth.js's own sign-in, callback, session and sign-out endpoints" };

// GET/POST /api/auth/* — Auth.js sign-in, callback, session and sign-out endpoints.
// Every link and redirect is built from APP_URL, never from the request's Host or
// X-Forwarded-Host (atAppOrigin); that also puts right the `localhost` Next's route handlers
// report, so cookies and links are right for the browser's origin.
// A password tried or a sign-in e-mail asked for counts against the sign-in limits first; the
// body is capped at the sign-in limit (64 KB) before Auth.js reads it.
export const GET = defineRoute({
  access,
  handler: (request) => getAuth(new NextRequest(request.url, { headers: request.headers })),
});

export const POST = defineRoute({
  access,
  body: { raw: (bytes) => bytes, limit: "signIn" },
  handler: (request, { body }) =>
    postAuth(
      new NextRequest(request.url, {
        method: "POST",
        headers: request.headers,
        body: body as Uint8Array<ArrayBuffer>,
      }),
    ),
});
