import "server-only";
import Stripe from "stripe";
import { env } from "../env";
import { AppError } from "../errors";

/** Which provider the `payments` rows name. */
export const PAYMENTS_PROVIDER = "stripe";

const globalForPayments = globalThis as unknown as { plumblinePayments?: Stripe };

/**
 * The `stripe` SDK's client, pointed at `PAYMENTS_URL` (the local fake in the demo and the tests,
 * https://api.stripe.com live). Without a secret key (live, unset) no payment can be taken.
 */
export function paymentsClient(): Stripe {
  if (globalForPayments.plumblinePayments) return globalForPayments.plumblinePayments;
  if (!env.STRIPE_SECRET_KEY) {
    throw new AppError("unavailable", "Payments are not set up on this server yet.");
  }
  const url = new URL(env.PAYMENTS_URL);
  const protocol = url.protocol === "http:" ? "http" : "https";
  const client = new Stripe(env.STRIPE_SECRET_KEY, {
    host: url.hostname,
    port: url.port ? Number(url.port) : protocol === "http" ? 80 : 443,
    protocol,
    maxNetworkRetries: 2,
    timeout: 15_000,
  });
  globalForPayments.plumblinePayments = client;
  return client;
}
