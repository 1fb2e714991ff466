import { formatMoney } from "../format-money";
import type { RefundPolicy } from "./refund-policy-schema";

/**
 * An event's refund policy in words, one sentence per tier, longest notice first:
 * "Withdraw 14 or more whole days before the event: 100 % back (£85.00)." With no tiers (or no
 * policy) nothing is refunded, and it says so.
 */
export function describeRefundPolicy(
  policy: RefundPolicy | null,
  fee: { amountMinor: number; currency: string },
): string[] {
  const tiers = [...(policy?.tiers ?? [])].sort((a, b) => b.daysBefore - a.daysBefore);
  if (tiers.length === 0) return ["The entry fee is not refunded if you withdraw."];
  const lines = tiers.map((t) => {
    const back = formatMoney(Math.floor((fee.amountMinor * t.percent) / 100), fee.currency);
    const when =
      t.daysBefore === 0
        ? "up to the event's date"
        : `${t.daysBefore} or more whole days before the event`;
    return `Withdraw ${when}: ${t.percent} % back (${back}).`;
  });
  lines.push("Later than that, the entry fee is not refunded.");
  return lines;
}
