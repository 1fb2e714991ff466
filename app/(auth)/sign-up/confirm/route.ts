import { NextResponse } from "next/server";
import { z } from "zod";
import { confirmUserEmail } from "@/db/queries/accounts/confirm-user-email";
import { hasLiveVerificationToken } from "@/db/queries/accounts/has-live-verification-token";
import { hashLinkToken } from "@/lib/accounts/hash-link-token";
import { emailSchema } from "@/lib/auth/sign-in-schema";
import { env } from "@/lib/env";
import { defineRoute } from "@/lib/http/define-route";
import { safeReturnPath } from "@/lib/http/safe-return-path";

// GET /sign-up/confirm?token=…&email=… — the account e-mail's link: confirms the address (so the
// password chosen at sign-up keeps working, see auth.ts) and hands the same token to Auth.js,
// which uses it up, signs the person in and opens their profile (or the same-site page they came
// from, such as a co-driver invitation: `next`).
export const GET = defineRoute({
  query: z.object({
    token: z.string().regex(/^[0-9a-f]{64}$/),
    email: emailSchema,
    next: z.string().max(2000).optional(),
  }),
  access: { public: "the link's token is the proof; without a live one nothing changes" },
  handler: async (_request, { query }) => {
    const appUrl = new URL(env.APP_URL);
    const tokenHash = hashLinkToken(query.token, env.AUTH_SECRET ?? "");
    if (!(await hasLiveVerificationToken({ identifier: query.email, tokenHash }))) {
      return NextResponse.redirect(new URL("/sign-in?error=Verification", appUrl), 303);
    }
    await confirmUserEmail({ email: query.email });
    const callback = new URL("/api/auth/callback/nodemailer", appUrl);
    callback.search = new URLSearchParams({
      callbackUrl: new URL(safeReturnPath(query.next, "/profile"), appUrl).toString(),
      token: query.token,
      email: query.email,
    }).toString();
    return NextResponse.redirect(callback, 303);
  },
});
