// A declined card and a cancelled checkout leave the entry unpaid, and its pay page says so.
// Sources: https://docs.stripe.com/api/events/types#event_types-payment_intent.payment_failed
// (a declined card fails the payment intent; the Checkout Session stays open for another
// card) and https://docs.stripe.com/api/checkout/sessions/expire (an open session can be
// expired so it can no longer be paid; the service then sends checkout.session.expired).
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_STRIPE_SECRET_KEY } from "@/lib/env";
import { paymentsOf, pressCheckoutButton, startCheckoutAs } from "../support/checkout-through-fake";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import {
  dateInDays,
  makePaymentsEntry,
  makePaymentsEvent,
  removePaymentsEvent,
} from "../support/payments-fixtures";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const paymentsUrl = inject("paymentsUrl");
const sdk = () =>
  new Stripe(DEMO_STRIPE_SECRET_KEY, {
    host: "127.0.0.1",
    port: Number(new URL(paymentsUrl).port),
    protocol: "http",
  });

let eventId: string;
let entryId: string;
let entrant: HttpSession;

beforeAll(async () => {
  ({ eventId } = await makePaymentsEvent(databaseUrl, { eventDate: dateInDays(new Date(), 30) }));
  entryId = await makePaymentsEntry(databaseUrl, { eventId, carNumber: 61 });
  entrant = new HttpSession(appUrl);
  await entrant.signInWithPassword(demo.entrant, demo.password);
});
afterAll(async () => {
  await removePaymentsEvent(databaseUrl, eventId);
});

async function payPageText(query = "") {
  const res = await entrant.fetch(`/entries/${entryId}/pay${query}`);
  expect(res.status).toBe(200);
  return res.text();
}

describe("not paid", () => {
  it("a declined card: the payment is failed, the entry unpaid, the page says declined", async () => {
    const { payment } = await startCheckoutAs(entrant, databaseUrl, entryId);
    const back = await pressCheckoutButton(paymentsUrl, payment?.provider_ref ?? "", "decline");
    expect(back.status).toBe(303);
    expect(back.headers.get("location")).toBe(`${appUrl}/entries/${entryId}/pay?checkout=back`);
    const rows = await paymentsOf(databaseUrl, entryId);
    expect(rows.map((r) => r.status)).toEqual(["failed"]);
    const page = await payPageText("?checkout=back");
    expect(page).toContain("Card declined: not paid");
    expect(page).toContain("Try again: pay");
    // Coming back closed the session: it cannot be paid later by surprise.
    expect((await sdk().checkout.sessions.retrieve(payment?.provider_ref ?? "")).status).toBe(
      "expired",
    );
    expect((await paymentsOf(databaseUrl, entryId)).map((r) => r.status)).toEqual(["failed"]);
  });

  it("a cancelled checkout: the payment is cancelled, the entry unpaid, the page says cancelled", async () => {
    const { payment } = await startCheckoutAs(entrant, databaseUrl, entryId);
    expect(payment?.status).toBe("pending");
    const back = await pressCheckoutButton(paymentsUrl, payment?.provider_ref ?? "", "cancel");
    expect(back.status).toBe(303);
    const page = await payPageText("?checkout=back");
    expect(page).toContain("Payment cancelled: not paid");
    const rows = await paymentsOf(databaseUrl, entryId);
    expect(rows.map((r) => r.status)).toEqual(["cancelled", "failed"]);
    expect((await sdk().checkout.sessions.retrieve(payment?.provider_ref ?? "")).status).toBe(
      "expired",
    );
    // The closed checkout's page refuses to take money.
    const late = await pressCheckoutButton(paymentsUrl, payment?.provider_ref ?? "", "pay");
    expect(late.status).toBe(410);
    expect((await paymentsOf(databaseUrl, entryId)).some((r) => r.status === "paid")).toBe(false);
  });
});
