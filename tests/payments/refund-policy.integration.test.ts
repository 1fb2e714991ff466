// Withdrawing refunds what the event's refund policy gives, through the payments SDK, and the
// waiting list moves up into the place. The policy is the demo club's (organizer's data):
// 100% at 14 or more days before, 50% at 3 or more, else nothing. Hand-worked: fee 8500 GBP
// (£85.00) → 20 days before: 8500; 5 days before: 4250; 1 day before: 0.
// Source for the refund call: https://docs.stripe.com/api/refunds/create (payment_intent +
// amount in the smallest currency unit; https://docs.stripe.com/currencies#zero-decimal for
// minor units: GBP has two decimals, so 8500 is £85.00).
import Stripe from "stripe";
import { afterAll, describe, expect, inject, it } from "vitest";
import { DEMO_STRIPE_SECRET_KEY } from "@/lib/env";
import { callServerAction } from "../support/call-server-action";
import {
  paymentsOf,
  pressCheckoutButton,
  startCheckoutAs,
  WITHDRAW_ACTION,
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
const sdk = new Stripe(DEMO_STRIPE_SECRET_KEY, {
  host: "127.0.0.1",
  port: Number(new URL(paymentsUrl).port),
  protocol: "http",
});
const made: string[] = [];

afterAll(async () => {
  for (const id of made) await removePaymentsEvent(databaseUrl, id);
});

async function signedInEntrant() {
  const s = new HttpSession(appUrl);
  await s.signInWithPassword(demo.entrant, demo.password);
  return s;
}

async function paidEntry(daysBefore: number, capacity = 30) {
  const { eventId } = await makePaymentsEvent(databaseUrl, {
    eventDate: dateInDays(new Date(), daysBefore),
    capacity,
  });
  made.push(eventId);
  const entryId = await makePaymentsEntry(databaseUrl, { eventId, carNumber: 71 });
  const entrant = await signedInEntrant();
  const { payment } = await startCheckoutAs(entrant, databaseUrl, entryId);
  await pressCheckoutButton(paymentsUrl, payment?.provider_ref ?? "", "pay");
  const [paid] = await paymentsOf(databaseUrl, entryId);
  expect(paid?.status).toBe("paid");
  return { eventId, entryId, entrant, paymentRef: paid?.payment_ref ?? "" };
}

async function withdraw(entrant: HttpSession, entryId: string) {
  return callServerAction(entrant, {
    action: WITHDRAW_ACTION,
    page: `/entries/${entryId}/withdraw`,
    fields: { entryId, confirm: "yes" },
    state: { status: "idle" },
  });
}

describe("withdrawing with the refund the policy gives", () => {
  for (const [days, refund] of [
    [20, 8500],
    [5, 4250],
    [1, 0],
  ] as const) {
    it(`${days} days before the event: ${refund} of 8500 back`, async () => {
      const { entryId, entrant, paymentRef } = await paidEntry(days);
      const since = Date.now();
      const answer = await withdraw(entrant, entryId);
      expect(answer.status).toBe(200);
      expect(answer.text).toContain('"status":"done"');
      const [entry] = await queryTestDb<{ status: string; withdrawn_at: Date | null }>(
        databaseUrl,
        "select status, withdrawn_at from entries where id = ?",
        [entryId],
      );
      expect(entry?.status).toBe("withdrawn");
      expect(entry?.withdrawn_at).not.toBeNull();
      const [p] = await paymentsOf(databaseUrl, entryId);
      expect(p?.refunded_minor).toBe(refund);
      expect(p?.status).toBe(refund > 0 ? "refunded" : "paid");
      // What the payments service holds: the refund made through the SDK, or none.
      const refunds = await sdk.refunds.list({ payment_intent: paymentRef });
      expect(refunds.data.reduce((sum, r) => sum + r.amount, 0)).toBe(refund);
      await waitForQueueIdle(databaseUrl);
      const mail = await waitForMail(
        mailboxUrl,
        since,
        (m) => m.to.includes(demo.entrant) && m.subject.startsWith("Withdrawn"),
      );
      expect(mail.length).toBe(1);
      // A second press changes nothing and refunds nothing more.
      const again = await withdraw(entrant, entryId);
      expect(again.text).toContain("already withdrawn");
      expect((await paymentsOf(databaseUrl, entryId))[0]?.refunded_minor).toBe(refund);
    });
  }

  it("the place freed goes to the waiting list's first, who is told", async () => {
    const { eventId, entryId, entrant } = await paidEntry(20, 1);
    const [other] = await queryTestDb<{ email: string }>(
      databaseUrl,
      `select distinct u.email from entries e join users u on u.id = e.driver_id
        where u.email <> ? order by u.email limit 1`,
      [demo.entrant],
    );
    const otherEmail = other?.email ?? "";
    const first = await makePaymentsEntry(databaseUrl, {
      eventId,
      carNumber: 72,
      status: "waiting",
      waitingSeq: 1,
      driverEmail: otherEmail,
    });
    const second = await makePaymentsEntry(databaseUrl, {
      eventId,
      carNumber: 73,
      status: "waiting",
      waitingSeq: 2,
      driverEmail: otherEmail,
    });
    const since = Date.now();
    expect((await withdraw(entrant, entryId)).text).toContain('"status":"done"');
    const rows = await queryTestDb<{ id: string; status: string }>(
      databaseUrl,
      "select id, status from entries where event_id = ? order by car_number",
      [eventId],
    );
    expect(rows).toEqual([
      { id: entryId, status: "withdrawn" },
      { id: first, status: "entered" },
      { id: second, status: "waiting" },
    ]);
    await waitForQueueIdle(databaseUrl);
    const moved = await waitForMail(
      mailboxUrl,
      since,
      (m) => m.to.includes(otherEmail) && m.subject.startsWith("You're in: car 72"),
    );
    expect(moved).toHaveLength(1);
  });
});
