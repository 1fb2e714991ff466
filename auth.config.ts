import type { NextAuthConfig } from "next-auth";
import { env } from "./lib/env";

/** Pages that need a signed-in person; the proxy redirects optimistically, pages still check. */
export const signedInPrefixes = [
  "/garage",
  "/entries",
  "/tech",
  "/clerk",
  "/organizer",
  "/registration",
  "/home",
];

/**
 * The part of the Auth.js configuration that needs no database: used by proxy.ts.
 * Sessions are signed JWT cookies that last a whole event day, so a phone that was offline all
 * morning can still sync at lunch.
 */
export const authConfig = {
  secret: env.AUTH_SECRET,
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
