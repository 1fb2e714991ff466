import { handlers } from "@/auth";
import { atAppOrigin, withSignInLimits } from "@/lib/auth/limit-auth-endpoint";

// GET/POST /api/auth/* — Auth.js sign-in, callback, session and sign-out endpoints.
// Every link and redirect is built from APP_URL, never from the request's Host or
// X-Forwarded-Host (atAppOrigin); that also puts right the `localhost` Next's route handlers
// report, so cookies and links are right for the browser's origin.
// A password tried or a sign-in e-mail asked for counts against the sign-in limits first.
export const GET = atAppOrigin(handlers.GET);
export const POST = withSignInLimits(atAppOrigin(handlers.POST));
