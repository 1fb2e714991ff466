import { DrizzleAdapter } from "@auth/drizzle-adapter";
import NextAuth from "next-auth";
import Credentials from "next-auth/providers/credentials";
import Nodemailer from "next-auth/providers/nodemailer";
import { authConfig } from "./auth.config";
import { getDb } from "./db/client";
import { clearUnconfirmedPassword } from "./db/queries/accounts/clear-unconfirmed-password";
import { getUserByEmail } from "./db/queries/get-user-by-email";
import { accounts, sessions, users, verificationTokens } from "./db/schema";
import { normalizeEmail } from "./lib/auth/normalize-email";
import { verifyPassword } from "./lib/auth/password";
import { passwordSignInSchema } from "./lib/auth/sign-in-schema";
import { env } from "./lib/env";
import { composeSignInMail } from "./lib/mail/compose-sign-in-mail";
import { sendMail } from "./lib/mail/send-mail";

const LINK_VALID_MINUTES = 30;

export const { handlers, auth, signIn, signOut } = NextAuth({
  ...authConfig,
  logger: {
    // A wrong password is an everyday event, answered on the form; keep it out of the error log.
    error(error) {
      // (`type`, not `name`: class names do not survive minification.)
      if ("type" in error && error.type === "CredentialsSignin") return;
      console.error("[auth]", error);
    },
  },
  callbacks: {
    ...authConfig.callbacks,
    /**
     * A sign-in link proves the mailbox, not the password: an account whose address was never
     * confirmed may carry a password chosen by whoever created it, so that password is dropped
     * when the mailbox's owner first signs in by link. (The account e-mail's own link confirms
     * the address first, app/(auth)/sign-up/confirm, so the password chosen at sign-up stays.)
     */
    async signIn({ user, account, email }) {
      // Also called when a link is only asked for (verificationRequest): nothing proven yet.
      if (account?.type === "email" && !email?.verificationRequest && user.email) {
        await clearUnconfirmedPassword({ email: user.email });
      }
      return true;
    },
  },
  adapter: DrizzleAdapter(getDb(), {
    usersTable: users,
    accountsTable: accounts,
    sessionsTable: sessions,
    verificationTokensTable: verificationTokens,
  }),
  providers: [
    Nodemailer({
      server: { host: env.SMTP_HOST, port: env.SMTP_PORT, secure: false },
      from: env.MAIL_FROM,
      maxAge: LINK_VALID_MINUTES * 60,
      // One spelling per address (lib/auth/normalize-email.ts); the link goes to that spelling
      // and the account is found by it, byte for byte.
      normalizeIdentifier(identifier) {
        const email = normalizeEmail(identifier);
        if (email === null) throw new Error("refused a sign-in link for an implausible address");
        return email;
      },
      async sendVerificationRequest({ identifier, url }) {
        // AUTH_URL is APP_URL (auth.config.ts); never mail a link to any other origin.
        if (new URL(url).origin !== new URL(env.APP_URL).origin) {
          throw new Error(`refused to mail a sign-in link for ${new URL(url).origin}`);
        }
        const mail = composeSignInMail({
          url,
          host: new URL(url).host,
          validMinutes: LINK_VALID_MINUTES,
        });
        await sendMail({ ...mail, to: identifier, kind: "sign-in-link" });
      },
    }),
    Credentials({
      credentials: {
        email: { label: "E-mail" },
        password: { label: "Password", type: "password" },
      },
      async authorize(raw) {
        const parsed = passwordSignInSchema.safeParse(raw);
        if (!parsed.success) return null;
        const user = await getUserByEmail({ email: parsed.data.email });
        const ok = await verifyPassword(parsed.data.password, user?.passwordHash);
        if (!user || !ok) return null;
        return { id: user.id, name: user.name, email: user.email };
      },
    }),
  ],
});
