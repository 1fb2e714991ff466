import { createHmac } from "node:crypto";

/**
 * The `Stripe-Signature` header the payments service sends with a webhook: `t=<unix seconds>,
 * v1=<hex HMAC-SHA256 of "<t>.<payload>" keyed with the endpoint's secret>`.
 * Source: https://docs.stripe.com/webhooks#verify-manually (steps 1–3).
 */
export function signWebhookPayload({
  payload,
  secret,
  timestampSeconds,
}: {
  payload: string;
  secret: string;
  timestampSeconds: number;
}): string {
  const v1 = createHmac("sha256", secret).update(`${timestampSeconds}.${payload}`).digest("hex");
  return `t=${timestampSeconds},v1=${v1}`;
}
