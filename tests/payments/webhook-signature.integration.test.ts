// A webhook whose signature does not verify is refused with 400 and changes nothing; the same
// bytes signed with the endpoint's secret are accepted. The good signature here is made by the
// SDK's own `webhooks.generateTestHeaderString`, independent of the fake's signer.
// Source: https://docs.stripe.com/webhooks#verify-manually — Stripe-Signature carries t=<unix
// seconds> and v1=<hex HMAC-SHA256 of "<t>.<raw body>" with the endpoint secret>; a receiver must
// compare against the raw body and refuse a timestamp outside its tolerance (300 s by default in
// the SDK, https://docs.stripe.com/webhooks#replay-attacks).
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_STRIPE_WEBHOOK_SECRET } from "@/lib/env";
import { signWebhookPayload } from "../../scripts/fakes/sign-webhook-payload";
import { paymentsOf, startCheckoutAs } from "../support/checkout-through-fake";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import {
  dateInDays,
  makePaymentsEntry,
  makePaymentsEvent,
  removePaymentsEvent,
} from "../support/payments-fixtures";
import { queryTestDb } from "../support/query-test-db";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const stripe = new Stripe("sk_test_unused_for_signing");

let eventId: string;
let entryId: string;
let sessionId: string;
let entrant: HttpSession;

beforeAll(async () => {
  ({ eventId } = await makePaymentsEvent(databaseUrl, { eventDate: dateInDays(new Date(), 30) }));
  entryId = await makePaymentsEntry(databaseUrl, { eventId, carNumber: 41 });
  entrant = new HttpSession(appUrl);
  await entrant.signInWithPassword(demo.entrant, demo.password);
  const { payment } = await startCheckoutAs(entrant, databaseUrl, entryId);
  if (!payment) throw new Error("no payment started");
  sessionId = payment.provider_ref;
});
afterAll(async () => {
  await removePaymentsEvent(databaseUrl, eventId);
});

/** A completed checkout for our session, as the service would send it. */
function completedEvent(eventIdText: string): string {
  return JSON.stringify({
    id: eventIdText,
    object: "event",
    api_version: "2025-10-29.clover",
    created: Math.floor(Date.now() / 1000),
    type: "checkout.session.completed",
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    data: {
      object: {
        id: sessionId,
        object: "checkout.session",
        payment_status: "paid",
        status: "complete",
        payment_intent: "pi_signature_test",
        amount_total: 8500,
        currency: "gbp",
      },
    },
  });
}

const post = (body: string, signature?: string) =>
  fetch(`${appUrl}/api/payments/webhook`, {
    method: "POST",
    headers: {
      "content-type": "application/json",
      ...(signature ? { "stripe-signature": signature } : {}),
    },
    body,
  });

async function snapshot() {
  const [p] = await paymentsOf(databaseUrl, entryId);
  const [events] = await queryTestDb<{ n: number }>(
    databaseUrl,
    "select count(*) as n from payment_webhook_events",
  );
  const [jobs] = await queryTestDb<{ n: number }>(
    databaseUrl,
    "select count(*) as n from jobs where dedupe_key like 'payment-receipt:%'",
  );
  return { status: p?.status, paymentRef: p?.payment_ref, events: events?.n, jobs: jobs?.n };
}

describe("the payments webhook's signature", () => {
  it("the fake signs as the SDK expects: its header verifies and equals the SDK's own for the same time", () => {
    const payload = completedEvent("evt_unit");
    const t = Math.floor(Date.now() / 1000);
    const ours = signWebhookPayload({
      payload,
      secret: DEMO_STRIPE_WEBHOOK_SECRET,
      timestampSeconds: t,
    });
    const theirs = stripe.webhooks.generateTestHeaderString({
      payload,
      secret: DEMO_STRIPE_WEBHOOK_SECRET,
      timestamp: t,
    });
    expect(ours).toBe(theirs);
    expect(stripe.webhooks.constructEvent(payload, ours, DEMO_STRIPE_WEBHOOK_SECRET).id).toBe(
      "evt_unit",
    );
  });

  it("refuses a wrong secret, a changed body, an old timestamp and no header with 400, and nothing changes", async () => {
    const before = await snapshot();
    expect(before.status).toBe("pending");
    const payload = completedEvent("evt_bad_signature");
    const now = Math.floor(Date.now() / 1000);
    const wrongSecret = signWebhookPayload({
      payload,
      secret: "whsec_someone_else",
      timestampSeconds: now,
    });
    const good = stripe.webhooks.generateTestHeaderString({
      payload,
      secret: DEMO_STRIPE_WEBHOOK_SECRET,
      timestamp: now,
    });
    // Older than the SDK's 300 s tolerance: a replayed capture.
    const stale = stripe.webhooks.generateTestHeaderString({
      payload,
      secret: DEMO_STRIPE_WEBHOOK_SECRET,
      timestamp: now - 301,
    });
    const tampered = payload.replace('"amount_total":8500', '"amount_total":1');
    for (const [body, header] of [
      [payload, wrongSecret],
      [tampered, good],
      [payload, stale],
      [payload, undefined],
      [payload, "t=1,v1=00"],
    ] as const) {
      const res = await post(body, header);
      expect(res.status).toBe(400);
    }
    expect(await snapshot()).toEqual(before);

    // The same bytes with the endpoint's secret go through: only the signature stopped them.
    const ok = await post(payload, good);
    expect(ok.status).toBe(200);
    const after = await snapshot();
    expect(after.status).toBe("paid");
    expect(after.paymentRef).toBe("pi_signature_test");
    expect(after.events).toBe((before.events ?? 0) + 1);
  });
});
