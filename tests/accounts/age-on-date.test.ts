import { describe, expect, it } from "vitest";
import { ageOnDate, isMinorOn } from "@/lib/scrutineer/calendar/age-on-date";

describe("ageOnDate", () => {
  // Source: Family Law Reform Act 1969 s.9(1) — a person attains an age in years at the
  // commencement of the relevant anniversary of the date of their birth: so on the birthday
  // itself, not the day after, and not before.
  it.each([
    ["2009-06-12", "2027-06-11", 17],
    ["2009-06-12", "2027-06-12", 18],
    ["2009-06-12", "2027-06-13", 18],
    ["2009-12-31", "2027-12-30", 17],
    ["2009-12-31", "2027-12-31", 18],
    ["2010-01-01", "2027-12-31", 17],
    ["1990-03-15", "1990-03-15", 0],
  ])("born %s, on %s: %i", (born, on, age) => {
    expect(ageOnDate(born, on)).toBe(age);
  });

  // from memory: in England and Wales someone born on 29 February is taken to reach a new age on
  // 1 March in a common year (no statute says so in these words; other jurisdictions use
  // 28 February). Leap years: Source: Gregorian rule (divisible by 4, not by 100 unless by 400).
  it.each([
    ["2008-02-29", "2026-02-28", 17],
    ["2008-02-29", "2026-03-01", 18],
    ["2008-02-29", "2028-02-28", 19],
    ["2008-02-29", "2028-02-29", 20],
    ["2000-02-29", "2100-02-28", 99], // 2100 is not a leap year
    ["2000-02-29", "2100-03-01", 100],
  ])("born on 29 February %s, on %s: %i", (born, on, age) => {
    expect(ageOnDate(born, on)).toBe(age);
  });

  it("is negative before the birth", () => {
    expect(ageOnDate("2027-06-12", "2027-06-11")).toBe(-1);
  });
});

describe("isMinorOn", () => {
  // Source: Family Law Reform Act 1969 s.1(1) — full age is 18.
  it.each([
    ["2009-06-12", "2027-06-11", true],
    ["2009-06-12", "2027-06-12", false],
    ["2008-02-29", "2026-02-28", true], // from memory: leapling turns 18 on 1 March
    ["2008-02-29", "2026-03-01", false],
  ])("born %s, on %s: minor %s", (born, on, minor) => {
    expect(isMinorOn(born, on)).toBe(minor);
  });
});
