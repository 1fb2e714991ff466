import "server-only";
import { randomBytes, randomUUID } from "node:crypto";
import { insertUserIfNew } from "@/db/queries/accounts/insert-user-if-new";
import { insertVerificationToken } from "@/db/queries/accounts/insert-verification-token";
import { enqueueJobs } from "@/db/queries/jobs/enqueue-jobs";
import { runTransaction } from "@/db/run-transaction";
import { hashPassword } from "../auth/password";
import { env } from "../env";
import { SEND_MAIL, type SendMailPayload } from "../jobs/job-kinds";
import { composeAccountLinkMail } from "../mail/compose-account-link-mail";
import { hashLinkToken } from "./hash-link-token";

/** How long the account e-mail's link works (Auth.js's own default for e-mail links: a day). */
export const ACCOUNT_LINK_VALID_HOURS = 24;

/**
 * Ask for an account for an address. A new address gets an account (name, and the password's
 * hash if one was chosen) and the account e-mail with a link that confirms the address and signs
 * the person in; an address that has an account is left as it is and its owner is told by
 * e-mail. The caller answers the same in both cases, so the page never says which addresses have
 * accounts. The e-mail is queued in the transaction that creates the account.
 */
export async function signUp(opts: {
  email: string;
  fullName: string;
  password: string | null;
  /** A same-site path to open once confirmed (an invitation the person came from); else the
   *  profile. */
  next?: string;
}): Promise<void> {
  // Hashed whether or not the address is new, so both take about as long.
  const passwordHash = opts.password === null ? null : await hashPassword(opts.password);
  const secret = env.AUTH_SECRET;
  if (!secret) throw new Error("AUTH_SECRET is not set");
  const token = randomBytes(32).toString("hex");
  const tokenHash = hashLinkToken(token, secret);
  const appUrl = new URL(env.APP_URL);
  await runTransaction(async (tx) => {
    const { created } = await insertUserIfNew(tx, {
      email: opts.email,
      name: opts.fullName,
      passwordHash,
    });
    if (created) {
      await insertVerificationToken(tx, {
        identifier: opts.email,
        tokenHash,
        expires: new Date(Date.now() + ACCOUNT_LINK_VALID_HOURS * 3600_000),
      });
    }
    const url = new URL("/sign-up/confirm", appUrl);
    url.search = new URLSearchParams({
      token,
      email: opts.email,
      ...(opts.next && opts.next !== "/profile" ? { next: opts.next } : {}),
    }).toString();
    const mail = created
      ? composeAccountLinkMail({
          kind: "new",
          fullName: opts.fullName,
          url: url.toString(),
          validHours: ACCOUNT_LINK_VALID_HOURS,
          withPassword: passwordHash !== null,
        })
      : composeAccountLinkMail({
          kind: "existing",
          signInUrl: new URL("/sign-in", appUrl).toString(),
        });
    await enqueueJobs(
      [
        {
          kind: SEND_MAIL,
          payload: {
            ...mail,
            to: opts.email,
            kind: "account-link",
            eventId: null,
            messageId: `<${randomUUID()}@${appUrl.hostname}>`,
          } satisfies SendMailPayload,
          dedupeKey: `account-link:${tokenHash}`,
        },
      ],
      tx,
    );
  });
}
