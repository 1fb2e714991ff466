import type { NextAuthConfig } from "next-auth";
import { env } from "./lib/env";
import { safeReturnPath } from "./lib/http/safe-return-path";

/** Pages that need a signed-in person; the proxy redirects optimistically, pages still check. */
export const signedInPrefixes = [
  "/garage",
  "/entries",
  "/tech",
  "/clerk",
  "/organizer",
  "/registration",
  "/home",
  "/profile",
];

/**
 * The part of the Auth.js configuration that needs no database: used by proxy.ts.
 * Sessions are signed JWT cookies that last a whole event day, so a phone that was offline all
 * morning can still sync at lunch.
 */
export const authConfig = {
  secret: env.AUTH_SECRET,
  // Auth.js builds links and redirects from the request's URL. The route handler hands it a
  // request at APP_URL's origin (lib/auth/limit-auth-endpoint.ts) and the sign-in actions refuse
  // a request for another host (lib/auth/request-origin-problem.ts), so no request header
  // chooses the origin. (No AUTH_URL: see request-origin-problem.ts.)
  trustHost: true,
  session: { strategy: "jwt", maxAge: env.SESSION_MAX_AGE_HOURS * 3600 },
  pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in" },
  providers: [],
  callbacks: {
    authorized({ auth, request }) {
      const path = request.nextUrl.pathname;
      if (!signedInPrefixes.some((prefix) => path === prefix || path.startsWith(`${prefix}/`))) {
        return true;
      }
      return Boolean(auth?.user);
    },
    /** Redirect only within this site: a path, or a URL on APP_URL's origin; else home. */
    redirect({ url, baseUrl }) {
      if (url.startsWith("/")) return `${baseUrl}${safeReturnPath(url)}`;
      try {
        const target = new URL(url);
        if (target.origin === baseUrl) {
          return `${baseUrl}${safeReturnPath(`${target.pathname}${target.search}${target.hash}`)}`;
        }
      } catch {
        // not a URL: fall through to home
      }
      return `${baseUrl}${safeReturnPath(undefined)}`;
    },
    jwt({ token, user }) {
      if (user?.id) token.sub = user.id;
      return token;
    },
    session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      return session;
    },
  },
} satisfies NextAuthConfig;
