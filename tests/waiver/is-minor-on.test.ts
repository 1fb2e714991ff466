import { describe, expect, it } from "vitest";
import { isMinorOn } from "@/lib/waivers/is-minor-on";

// Under 18 on the event date needs a parent's or guardian's acceptance — common practice (no source).
describe("isMinorOn (the waiver's private helper until the accounts part's is merged)", () => {
  it("is of age from the 18th birthday itself", () => {
    expect(isMinorOn("2013-06-12", "2031-06-11")).toBe(true);
    expect(isMinorOn("2013-06-12", "2031-06-12")).toBe(false);
    expect(isMinorOn("1990-01-01", "2031-06-12")).toBe(false);
  });

  it("counts a 29 February birthday as reached on 1 March in a common year", () => {
    // common practice (no source): a leap-day birthday falls on 1 March when there is no 29 Feb.
    expect(isMinorOn("2012-02-29", "2030-02-28")).toBe(true);
    expect(isMinorOn("2012-02-29", "2030-03-01")).toBe(false);
    // 2032 is a leap year (Source: the Gregorian calendar's rule: divisible by 4, not by 100
    // unless by 400), so the birthday is 29 Feb itself.
    expect(isMinorOn("2014-02-28", "2032-02-28")).toBe(false);
    expect(isMinorOn("2012-02-29", "2032-02-28")).toBe(false);
  });

  it("treats an unreadable date as no minor (the profile refuses those)", () => {
    expect(isMinorOn("12/06/2013", "2031-06-12")).toBe(false);
  });
});
