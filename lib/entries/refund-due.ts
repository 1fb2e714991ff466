import { daysBetweenDates } from "../scrutineer/calendar/days-between-dates";
import { localDateInZone } from "../scrutineer/calendar/local-date-in-zone";
import type { RefundPolicy } from "./refund-policy-schema";

export type RefundDue = {
  /** Whole calendar days from the withdrawal's date at the venue to the event's date. */
  daysBefore: number;
  /** The percentage of the fee paid that comes back (0 when no tier applies). */
  percent: number;
  /** What comes back, in the payment's minor units, rounded down to a whole minor unit. */
  amountMinor: number;
};

/**
 * What a withdrawal made at `withdrawnAt` gets back under the event's refund policy: the days
 * before are counted between calendar dates at the venue (`timeZone`), so a withdrawal at 23:30
 * on the 1st is one day before an event on the 2nd; the first tier whose `daysBefore` is at most
 * that wins (tiers are read from the most days down); no policy or no tier → nothing. Pure.
 */
export function refundDue({
  policy,
  paidMinor,
  eventDate,
  timeZone,
  withdrawnAt,
}: {
  policy: RefundPolicy | null;
  paidMinor: number;
  /** The event's date at the venue, YYYY-MM-DD. */
  eventDate: string;
  timeZone: string;
  withdrawnAt: Date;
}): RefundDue {
  const today = localDateInZone(withdrawnAt.getTime(), timeZone);
  const daysBefore = daysBetweenDates(today, eventDate);
  const tiers = [...(policy?.tiers ?? [])].sort((a, b) => b.daysBefore - a.daysBefore);
  const tier = tiers.find((t) => daysBefore >= t.daysBefore);
  const percent = tier?.percent ?? 0;
  return { daysBefore, percent, amountMinor: Math.floor((paidMinor * percent) / 100) };
}
