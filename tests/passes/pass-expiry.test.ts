import { describe, expect, it } from "vitest";
import {
  defaultPassExpiryMarginSeconds,
  endOfLocalDateMs,
  passValidityWindow,
} from "@/lib/passes/pass-expiry";
import { localDateInZone } from "@/lib/scrutineer/calendar/local-date-in-zone";

const iso = (ms: number) => new Date(ms).toISOString();
const hours = (ms: number) => ms / 3_600_000;

describe("endOfLocalDateMs — Europe/London across daylight saving", () => {
  // Source: IANA tz database, Europe/London (rule "EU", from memory): summer time from the last
  // Sunday of March at 01:00 UTC, back to GMT on the last Sunday of October at 01:00 UTC.
  // In 2027 those Sundays are 28 March and 31 October.
  it("a Saturday in GMT ends at midnight UTC", () => {
    expect(iso(endOfLocalDateMs("2027-03-27", "Europe/London"))).toBe("2027-03-28T00:00:00.000Z");
  });

  it("the spring-forward Sunday ends at midnight BST, 23 hours after it began", () => {
    const end = endOfLocalDateMs("2027-03-28", "Europe/London");
    expect(iso(end)).toBe("2027-03-28T23:00:00.000Z");
    expect(hours(end - endOfLocalDateMs("2027-03-27", "Europe/London"))).toBe(23);
  });

  it("a Saturday in BST ends at 23:00 UTC", () => {
    expect(iso(endOfLocalDateMs("2027-10-30", "Europe/London"))).toBe("2027-10-30T23:00:00.000Z");
  });

  it("the fall-back Sunday ends at midnight GMT, 25 hours after it began", () => {
    const end = endOfLocalDateMs("2027-10-31", "Europe/London");
    expect(iso(end)).toBe("2027-11-01T00:00:00.000Z");
    expect(hours(end - endOfLocalDateMs("2027-10-30", "Europe/London"))).toBe(25);
  });
});

describe("endOfLocalDateMs — against Intl itself, every day of 2027", () => {
  // Reference: the runtime's ICU time-zone data through Intl.DateTimeFormat (localDateInZone):
  // one second before the end the venue's calendar still shows the date, at the end it shows
  // the next one. Zones picked for awkward rules: midnight transitions (America/Santiago,
  // America/Havana), half-hour DST (Australia/Lord_Howe), +05:45 (Asia/Kathmandu), +14 and −11.
  const zones = [
    "Europe/London",
    "America/Santiago",
    "America/Havana",
    "Australia/Lord_Howe",
    "Asia/Kathmandu",
    "Pacific/Kiritimati",
    "Pacific/Pago_Pago",
    "UTC",
  ];
  it.each(zones)("%s", (zone) => {
    const start = Date.UTC(2027, 0, 1);
    for (let day = 0; day < 365; day += 1) {
      const date = new Date(start + day * 86_400_000).toISOString().slice(0, 10);
      const next = new Date(start + (day + 1) * 86_400_000).toISOString().slice(0, 10);
      const end = endOfLocalDateMs(date, zone);
      expect(localDateInZone(end - 1000, zone), `${zone} ${date}`).toBe(date);
      expect(localDateInZone(end, zone), `${zone} ${date}`).toBe(next);
    }
  });
});

describe("passValidityWindow", () => {
  it("runs from issue to the end of the event's local date plus the margin", () => {
    const issuedAt = new Date("2027-10-30T07:45:12.345Z");
    const w = passValidityWindow({ issuedAt, eventDate: "2027-10-31", timeZone: "Europe/London" });
    expect(w.iat).toBe(Date.parse("2027-10-30T07:45:12Z") / 1000);
    expect(w.exp).toBe(Date.parse("2027-11-01T00:00:00Z") / 1000 + defaultPassExpiryMarginSeconds);
  });

  it("takes the margin as a parameter", () => {
    const w = passValidityWindow({
      issuedAt: new Date("2027-03-27T09:00:00Z"),
      eventDate: "2027-03-28",
      timeZone: "Europe/London",
      marginSeconds: 0,
    });
    expect(new Date(w.exp * 1000).toISOString()).toBe("2027-03-28T23:00:00.000Z");
  });

  it("leaves exp at or before iat once the event is over, so the caller refuses to issue", () => {
    const w = passValidityWindow({
      issuedAt: new Date("2027-04-19T12:00:00Z"),
      eventDate: "2027-04-17",
      timeZone: "Europe/London",
    });
    expect(w.exp).toBeLessThanOrEqual(w.iat);
  });
});
