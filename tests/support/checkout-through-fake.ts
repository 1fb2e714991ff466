import { callServerAction } from "./call-server-action";
import type { HttpSession } from "./http-session";
import { queryTestDb } from "./query-test-db";

export const PAY_ACTION = "app/(entrant)/entries/[entryId]/pay/actions.ts#startCheckoutAction";
export const WITHDRAW_ACTION =
  "app/(entrant)/entries/[entryId]/withdraw/actions.ts#withdrawEntryAction";

export type PaymentRow = {
  id: string;
  provider_ref: string;
  status: string;
  amount_minor: number;
  currency: string;
  payment_ref: string | null;
  refunded_minor: number;
};

/** Press "Pay" on the entry's pay page (the server action) and return the payment row it made. */
export async function startCheckoutAs(
  session: HttpSession,
  databaseUrl: string,
  entryId: string,
): Promise<{ answer: { status: number; text: string }; payment: PaymentRow | undefined }> {
  const answer = await callServerAction(session, {
    action: PAY_ACTION,
    page: `/entries/${entryId}/pay`,
    fields: { entryId },
    state: { status: "idle" },
  });
  return { answer, payment: (await paymentsOf(databaseUrl, entryId))[0] };
}

/** The entry's payments, newest first. */
export async function paymentsOf(databaseUrl: string, entryId: string): Promise<PaymentRow[]> {
  return queryTestDb<PaymentRow>(
    databaseUrl,
    `select id, provider_ref, status, amount_minor, currency, payment_ref, refunded_minor
       from payments where entry_id = ? order by created_at desc, id desc`,
    [entryId],
  );
}

/** Press a button on the fake's hosted checkout page; the answer's redirect (not followed). */
export async function pressCheckoutButton(
  paymentsUrl: string,
  sessionId: string,
  button: "pay" | "decline" | "cancel",
): Promise<Response> {
  return fetch(`${paymentsUrl}/checkout/${sessionId}/${button}`, {
    method: "POST",
    redirect: "manual",
  });
}

/** The events the fake has sent, as it keeps them. */
export async function fakeEvents(
  paymentsUrl: string,
): Promise<Array<{ id: string; type: string; data: { object: { id: string } } }>> {
  return (await fetch(`${paymentsUrl}/_fake/events`)).json() as Promise<
    Array<{ id: string; type: string; data: { object: { id: string } } }>
  >;
}
