import { describe, expect, it } from "vitest";
import { refundDue } from "@/lib/entries/refund-due";

// The demo club's policy (organizer's data, not a trade fact): 100% at ≥ 14 days, 50% at ≥ 3.
const policy = {
  tiers: [
    { daysBefore: 3, percent: 50 },
    { daysBefore: 14, percent: 100 },
  ],
};
// Hand-worked dates for an event on Sat 14 Jun 2031 at a venue in Europe/London, which is on
// BST (UTC+1) in June. Source: https://www.gov.uk/when-do-the-clocks-change — British Summer
// Time runs from the last Sunday of March to the last Sunday of October.
const base = { policy, paidMinor: 8500, eventDate: "2031-06-14", timeZone: "Europe/London" };

describe("refundDue", () => {
  it.each([
    // [withdrawn at (UTC), days before, percent, minor units back]
    ["2031-05-31T10:00:00Z", 14, 100, 8500], // 31 May → 14 Jun: 14 days, first tier
    ["2031-05-31T22:59:00Z", 14, 100, 8500], // 23:59 BST on 31 May: still 31 May at the venue
    ["2031-05-31T23:00:00Z", 13, 50, 4250], // 00:00 BST on 1 Jun: 13 days, second tier
    ["2031-06-11T22:59:00Z", 3, 50, 4250], // 23:59 BST on 11 Jun: 3 days
    ["2031-06-11T23:00:00Z", 2, 0, 0], // 00:00 BST on 12 Jun: 2 days, no tier
    ["2031-06-14T08:00:00Z", 0, 0, 0], // the day itself
  ] as const)("withdrawn %s: %i days before, %i percent, %i back", (at, days, percent, amount) => {
    expect(refundDue({ ...base, withdrawnAt: new Date(at) })).toEqual({
      daysBefore: days,
      percent,
      amountMinor: amount,
    });
  });

  it("rounds down to a whole minor unit: half of 8501 is 4250", () => {
    // common practice (no source): a refund is never more than the share the policy names.
    expect(
      refundDue({ ...base, paidMinor: 8501, withdrawnAt: new Date("2031-06-05T12:00:00Z") })
        .amountMinor,
    ).toBe(4250);
  });

  it("no policy or nothing paid gives nothing back", () => {
    const at = new Date("2031-05-01T12:00:00Z");
    expect(refundDue({ ...base, policy: null, withdrawnAt: at }).amountMinor).toBe(0);
    expect(refundDue({ ...base, paidMinor: 0, withdrawnAt: at }).amountMinor).toBe(0);
  });
});
