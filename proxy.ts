import type { NextRequest } from "next/server";
import NextAuth from "next-auth";
import { authConfig } from "./auth.config";

const { auth } = NextAuth(authConfig);

// Optimistic redirect to sign-in for signed-in areas (the `authorized` callback). Every page,
// route handler and server action still checks permissions itself (lib/auth/require-*.ts).
export function proxy(request: NextRequest) {
  return (auth as unknown as (r: NextRequest) => Promise<Response>)(request);
}

export const config = {
  matcher: [
    "/((?!api|_next/static|_next/image|sw.js|swe-worker|manifest.webmanifest|icons|favicon).*)",
  ],
};
