/**
 * How often a person may try to sign in, as data. Counted per account (the normalized e-mail
 * address, whether or not an account has it, so the limit never tells which addresses exist)
 * and per client address (lib/auth/client-address.ts). Failed password attempts count; a
 * correct password gives its attempt back, so signing in many times a day costs nothing.
 * Every sign-in e-mail counts.
 *
 * The per-address numbers are sized for an event day's paddock Wi-Fi, where every official and
 * entrant shares one public address: 100 mistyped passwords, or 100 links, in 15 minutes from
 * one network is far beyond a morning rush and still far below a guessing run.
 */
export type SignInLimitRule = {
  /** Key prefix in the store (table `rate_limits`). */
  keyPrefix: string;
  /** Attempts allowed per window. */
  points: number;
  windowSeconds: number;
  /** Once over the limit, refused for this long. */
  blockSeconds: number;
  /** What the person reads; `{minutes}` is filled in. */
  message: string;
};

const FIFTEEN_MINUTES = 15 * 60;

export const signInLimitRules = {
  passwordPerAccount: {
    keyPrefix: "signin-password-account",
    points: 10,
    windowSeconds: FIFTEEN_MINUTES,
    blockSeconds: FIFTEEN_MINUTES,
    message: "Too many sign-in attempts for this address. Try again in {minutes}.",
  },
  passwordPerClient: {
    keyPrefix: "signin-password-client",
    points: 100,
    windowSeconds: FIFTEEN_MINUTES,
    blockSeconds: FIFTEEN_MINUTES,
    message: "Too many sign-in attempts from this network. Try again in {minutes}.",
  },
  linkPerAccount: {
    keyPrefix: "signin-link-account",
    points: 5,
    windowSeconds: FIFTEEN_MINUTES,
    blockSeconds: FIFTEEN_MINUTES,
    message: "Too many sign-in links were asked for this address. Try again in {minutes}.",
  },
  linkPerClient: {
    keyPrefix: "signin-link-client",
    points: 100,
    windowSeconds: FIFTEEN_MINUTES,
    blockSeconds: FIFTEEN_MINUTES,
    message: "Too many sign-in links were asked from this network. Try again in {minutes}.",
  },
} as const satisfies Record<string, SignInLimitRule>;

export type SignInLimitRuleName = keyof typeof signInLimitRules;

/** Whole minutes to wait, rounded up, at least 1 (the Retry-After header carries seconds). */
export function waitMinutes(msBeforeNext: number): number {
  return Math.max(1, Math.ceil(msBeforeNext / 60_000));
}

/** The rule's message with the wait in words: "Try again in 15 minutes." */
export function limitMessage(rule: SignInLimitRule, msBeforeNext: number): string {
  const minutes = waitMinutes(msBeforeNext);
  return rule.message.replace("{minutes}", minutes === 1 ? "1 minute" : `${minutes} minutes`);
}
