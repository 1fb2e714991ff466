// The same webhook delivered three times — one after another and three at once — marks the
// payment paid once and sends one receipt. Source: https://docs.stripe.com/webhooks#handle-duplicate-events
// ("Webhook endpoints might occasionally receive the same event more than once… log the event
// IDs you've processed, and then not process already-logged events"); the service retries a
// delivery it got no 2xx for (https://docs.stripe.com/webhooks#retries).
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_STRIPE_SECRET_KEY } from "@/lib/env";
import {
  fakeEvents,
  paymentsOf,
  pressCheckoutButton,
  startCheckoutAs,
} from "../support/checkout-through-fake";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { waitForMail } from "../support/mailbox";
import {
  dateInDays,
  makePaymentsEntry,
  makePaymentsEvent,
  removePaymentsEvent,
} from "../support/payments-fixtures";
import { queryTestDb } from "../support/query-test-db";
import { waitForQueueIdle } from "../support/wait-for-queue-idle";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const paymentsUrl = inject("paymentsUrl");
const mailboxUrl = inject("mailboxUrl");

let eventId: string;
let entrant: HttpSession;

beforeAll(async () => {
  ({ eventId } = await makePaymentsEvent(databaseUrl, { eventDate: dateInDays(new Date(), 30) }));
  entrant = new HttpSession(appUrl);
  await entrant.signInWithPassword(demo.entrant, demo.password);
});
afterAll(async () => {
  await removePaymentsEvent(databaseUrl, eventId);
});

async function receiptsFor(paymentId: string) {
  const [row] = await queryTestDb<{ n: number }>(
    databaseUrl,
    "select count(*) as n from jobs where dedupe_key = ?",
    [`payment-receipt:${paymentId}`],
  );
  return Number(row?.n ?? 0);
}

describe("a paid checkout's webhook delivered again", () => {
  for (const mode of ["one after another", "three at once"] as const) {
    it(`${mode}: one paid mark, one receipt`, async () => {
      const carNumber = mode === "three at once" ? 52 : 51;
      const entryId = await makePaymentsEntry(databaseUrl, { eventId, carNumber });
      const since = Date.now();
      const { payment } = await startCheckoutAs(entrant, databaseUrl, entryId);
      expect(payment?.status).toBe("pending");
      // The event's fee in minor units with its currency (the demo's open event: 8500 GBP).
      expect(payment?.amount_minor).toBe(8500);
      expect(payment?.currency).toBe("GBP");
      const session = payment?.provider_ref ?? "";

      const back = await pressCheckoutButton(paymentsUrl, session, "pay");
      expect(back.status).toBe(303);
      expect(back.headers.get("location")).toBe(`${appUrl}/entries/${entryId}/pay?checkout=done`);
      const completed = (await fakeEvents(paymentsUrl)).filter(
        (e) => e.type === "checkout.session.completed" && e.data.object.id === session,
      );
      expect(completed).toHaveLength(1);
      const eventIdText = completed[0]?.id ?? "";
      const deliver = () =>
        fetch(`${paymentsUrl}/_fake/events/${eventIdText}/deliver`, { method: "POST" }).then(
          (r) => r.json() as Promise<{ status: number }>,
        );
      // Delivered once by the Pay button; twice more, each signed anew, answered 200.
      const again =
        mode === "three at once"
          ? await Promise.all([deliver(), deliver(), deliver()])
          : [await deliver(), await deliver()];
      for (const a of again) expect(a.status).toBe(200);

      const rows = await paymentsOf(databaseUrl, entryId);
      expect(rows.filter((r) => r.status === "paid")).toHaveLength(1);
      const [noted] = await queryTestDb<{ n: number }>(
        databaseUrl,
        "select count(*) as n from payment_webhook_events where provider_event_id = ?",
        [eventIdText],
      );
      expect(Number(noted?.n)).toBe(1);
      expect(await receiptsFor(payment?.id ?? "")).toBe(1);

      // The SDK's view of the session agrees, and the receipt arrives once.
      const sdk = new Stripe(DEMO_STRIPE_SECRET_KEY, {
        host: "127.0.0.1",
        port: Number(new URL(paymentsUrl).port),
        protocol: "http",
      });
      const seen = await sdk.checkout.sessions.retrieve(session);
      expect(seen.payment_status).toBe("paid");
      expect(rows[0]?.payment_ref).toBe(seen.payment_intent);
      await waitForQueueIdle(databaseUrl);
      const mail = await waitForMail(
        mailboxUrl,
        since,
        (m) =>
          m.to.includes(demo.entrant) &&
          m.subject.startsWith("Receipt: entry fee £85.00") &&
          m.text.includes(`car ${carNumber} `),
      );
      expect(mail).toHaveLength(1);
      expect(mail[0]?.text).toContain(`car ${carNumber}`);
    });
  }
});
