import { describe, expect, it } from "vitest";
import { localIsoDateTime } from "@/lib/paddock/local-iso-date-time";
import { zonedWallTime } from "@/lib/paddock/zoned-wall-time";
import { zoneOffsetMinutes } from "@/lib/scrutineer/calendar/zone-offset-minutes";

// Every expected instant below is worked out by hand from the IANA tz database's rule lines
// (tzdata files `europe`, `northamerica`, `australasia`), not from the code under test.

describe("zonedWallTime — Europe/London, 2027-03-28 (clocks go forward)", () => {
  // Source: IANA tz database, europe: `Zone Europe/London ... 0:00 EU GMT/BST` (since 1996) and
  // `Rule EU 1981 max - Mar lastSun 1:00u 1:00 S`. 2027-03-01 is a Monday (2027-01-01 is a Friday,
  // +59 days), so the last Sunday of March is the 28th; at 01:00 UTC GMT (+00:00) becomes BST (+01:00).
  const zone = "Europe/London";
  const date = "2027-03-28";

  it("00:30 is still GMT: 00:30Z", () => {
    expect(zonedWallTime({ date, time: "00:30", timeZone: zone })).toEqual({
      utcMs: Date.UTC(2027, 2, 28, 0, 30),
      instant: "2027-03-28T00:30:00.000Z",
      fit: "exact",
    });
  });

  it("09:00 is BST: 08:00Z", () => {
    expect(zonedWallTime({ date, time: "09:00", timeZone: zone }).instant).toBe(
      "2027-03-28T08:00:00.000Z",
    );
  });

  it("01:30 never happens; read with the offset before the gap (GMT): 01:30Z = 02:30 BST", () => {
    // Source: RFC 5545 §3.3.5 — a non-existent local time "is interpreted using the UTC offset
    // before the gap in local times".
    const t = zonedWallTime({ date, time: "01:30", timeZone: zone });
    expect(t.fit).toBe("gap");
    expect(t.instant).toBe("2027-03-28T01:30:00.000Z");
    expect(localIsoDateTime(t.utcMs, zone)).toBe("2027-03-28T02:30:00+01:00");
  });

  it("the offset is 0 just before 01:00Z and +60 minutes from then on", () => {
    expect(zoneOffsetMinutes(Date.UTC(2027, 2, 28, 0, 59, 59), zone)).toBe(0);
    expect(zoneOffsetMinutes(Date.UTC(2027, 2, 28, 1, 0, 0), zone)).toBe(60);
  });
});

describe("zonedWallTime — America/New_York, 2027-11-07 (clocks go back)", () => {
  // Source: IANA tz database, northamerica: `Zone America/New_York ... -5:00 US E%sT` and
  // `Rule US 2007 max - Nov Sun>=1 2:00 0 S`. 2027-11-01 is a Monday (day 305 of a year that
  // starts on a Friday), so the first Sunday is the 7th; at 02:00 EDT (−04:00) = 06:00Z the clocks
  // go back to 01:00 EST (−05:00).
  const zone = "America/New_York";
  const date = "2027-11-07";

  it("01:30 happens twice; the first one (EDT) is taken: 05:30Z", () => {
    // Source: RFC 5545 §3.3.5 — a local time that occurs twice "refers to the first occurrence".
    const t = zonedWallTime({ date, time: "01:30", timeZone: zone });
    expect(t.fit).toBe("repeated");
    expect(t.instant).toBe("2027-11-07T05:30:00.000Z");
    expect(localIsoDateTime(t.utcMs, zone)).toBe("2027-11-07T01:30:00-04:00");
  });

  it("09:00 is EST: 14:00Z (and 09:00 the day before is EDT: 13:00Z)", () => {
    expect(zonedWallTime({ date, time: "09:00", timeZone: zone })).toMatchObject({
      instant: "2027-11-07T14:00:00.000Z",
      fit: "exact",
    });
    expect(zonedWallTime({ date: "2027-11-06", time: "09:00", timeZone: zone }).instant).toBe(
      "2027-11-06T13:00:00.000Z",
    );
  });
});

describe("zonedWallTime — gaps elsewhere", () => {
  it("America/New_York 2027-03-14 02:30 never happens: 07:30Z = 03:30 EDT", () => {
    // Source: IANA tz database, northamerica: `Rule US 2007 max - Mar Sun>=8 2:00 1:00 D`;
    // 2027-03-08 is a Monday, so the change is Sunday the 14th at 02:00 EST. RFC 5545 §3.3.5 gives
    // its own example of this rule: TZID=America/New_York:20070311T023000 is 03:30 EDT.
    const t = zonedWallTime({ date: "2027-03-14", time: "02:30", timeZone: "America/New_York" });
    expect(t).toMatchObject({ fit: "gap", instant: "2027-03-14T07:30:00.000Z" });
  });

  it("Australia/Lord_Howe moves half an hour: 02:15 on 2027-10-03 never happens → 02:45 +11:00", () => {
    // Source: IANA tz database, australasia: `Zone Australia/Lord_Howe ... 10:30 LH +1030/+1130`
    // and `Rule LH 2008 max - Oct Sun>=1 2:00 0:30 -`. 2027-10-01 is a Friday, so the change is
    // Sunday the 3rd at 02:00 (+10:30) → 02:30 (+11:00). 02:15 read at +10:30 is 15:45Z the day
    // before, which is 02:45 at +11:00.
    const t = zonedWallTime({ date: "2027-10-03", time: "02:15", timeZone: "Australia/Lord_Howe" });
    expect(t).toMatchObject({ fit: "gap", instant: "2027-10-02T15:45:00.000Z" });
    expect(localIsoDateTime(t.utcMs, "Australia/Lord_Howe")).toBe("2027-10-03T02:45:00+11:00");
  });

  it("rejects an unknown zone and a malformed time", () => {
    expect(() =>
      zonedWallTime({ date: "2027-06-12", time: "09:00", timeZone: "Mars/Olympus" }),
    ).toThrow(RangeError);
    expect(() => zonedWallTime({ date: "2027-06-12", time: "9:00", timeZone: "UTC" })).toThrow(
      RangeError,
    );
  });
});
