import "server-only";
import { RateLimiterMemory, RateLimiterMySQL, RateLimiterRes } from "rate-limiter-flexible";
import { getPool } from "@/db/client";
import { env } from "@/lib/env";
import {
  limitMessage,
  type SignInLimitRule,
  type SignInLimitRuleName,
  signInLimitRules,
} from "./sign-in-limit-rules";

/**
 * Sign-in limits (rules in sign-in-limit-rules.ts) on rate-limiter-flexible's MySQL store: the
 * counters live in MariaDB's `rate_limits` table, through the app's own mysql2 pool, so they
 * survive a restart and hold across several app servers. If MariaDB does not answer, an
 * in-memory limiter with the same rules stands in (per process) until it does.
 */
type Limiter = RateLimiterMySQL;

const globalForLimits = globalThis as unknown as {
  plumblineSignInLimiters?: Map<SignInLimitRuleName, Limiter>;
};

function databaseName(url: string): string {
  return decodeURIComponent(new URL(url.replace(/^mysql:/, "http:")).pathname.slice(1));
}

function limiter(name: SignInLimitRuleName): Limiter {
  globalForLimits.plumblineSignInLimiters ??= new Map();
  const cached = globalForLimits.plumblineSignInLimiters.get(name);
  if (cached) return cached;
  const rule: SignInLimitRule = signInLimitRules[name];
  const shape = {
    keyPrefix: rule.keyPrefix,
    points: rule.points,
    duration: rule.windowSeconds,
    blockDuration: rule.blockSeconds,
  };
  const created = new RateLimiterMySQL({
    ...shape,
    // mysql2's callback pool under the app's promise pool (db/client.ts)
    storeClient: getPool().pool,
    storeType: "pool",
    dbName: databaseName(env.DATABASE_URL),
    tableName: "rate_limits",
    tableCreated: true, // migration 0002_rate-limits
    insuranceLimiter: new RateLimiterMemory(shape),
  });
  globalForLimits.plumblineSignInLimiters.set(name, created);
  return created;
}

export type SignInLimitResult =
  | { ok: true }
  | { ok: false; retryAfterSeconds: number; message: string };

export type SignInLimitKind = "password" | "link";

type Who = {
  /** Normalized (lib/auth/normalize-email.ts), or null when what was typed is not an address. */
  email: string | null;
  clientAddress: string;
};

function keysFor(kind: SignInLimitKind, who: Who): [SignInLimitRuleName, string][] {
  const perAccount = kind === "password" ? "passwordPerAccount" : "linkPerAccount";
  const perClient = kind === "password" ? "passwordPerClient" : "linkPerClient";
  const keys: [SignInLimitRuleName, string][] = [[perClient, who.clientAddress]];
  if (who.email) keys.unshift([perAccount, who.email]);
  return keys;
}

/**
 * Count one sign-in attempt (a password tried, a link asked for) against the account and the
 * client address, before anything is checked or sent. Refused when either is over its limit,
 * with the wait and the words to show; the account's limit is named first.
 */
export async function takeSignInAttempt(
  kind: SignInLimitKind,
  who: Who,
): Promise<SignInLimitResult> {
  const results = await Promise.all(
    keysFor(kind, who).map(async ([name, key]) => {
      try {
        await limiter(name).consume(key);
        return null;
      } catch (rejection) {
        if (!(rejection instanceof RateLimiterRes)) throw rejection;
        return { rule: signInLimitRules[name], msBeforeNext: rejection.msBeforeNext };
      }
    }),
  );
  const refused = results.find((r) => r !== null);
  if (!refused) return { ok: true };
  return {
    ok: false,
    retryAfterSeconds: Math.max(1, Math.ceil(refused.msBeforeNext / 1000)),
    message: limitMessage(refused.rule, refused.msBeforeNext),
  };
}

/** A correct password gives its attempt back, on the account and on the client address. */
export async function forgivePasswordAttempt(who: Who): Promise<void> {
  await Promise.all(keysFor("password", who).map(([name, key]) => limiter(name).reward(key)));
}
