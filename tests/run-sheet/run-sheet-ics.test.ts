import ICAL from "ical.js";
import { describe, expect, it } from "vitest";
import { runSheetIcs } from "@/lib/run-sheet/run-sheet-ics";
import { sheet } from "../paddock/run-sheet-fixture";

type Parsed = {
  uid: string;
  summary: string;
  start: string;
  end: string;
  sequence: number;
  utc: boolean;
};

/** Reads the file back with ical.js, an independent RFC 5545 parser. */
function parse(text: string): { prodId: string; method: string; events: Parsed[] } {
  const calendar = new ICAL.Component(ICAL.parse(text));
  const events = calendar.getAllSubcomponents("vevent").map((v) => {
    const e = new ICAL.Event(v);
    return {
      uid: e.uid,
      summary: e.summary,
      start: e.startDate.toJSDate().toISOString(),
      end: e.endDate.toJSDate().toISOString(),
      sequence: e.sequence,
      utc:
        e.startDate.zone === ICAL.Timezone.utcTimezone &&
        e.endDate.zone === ICAL.Timezone.utcTimezone,
    };
  });
  return {
    prodId: String(calendar.getFirstPropertyValue("prodid")),
    method: String(calendar.getFirstPropertyValue("method")),
    events,
  };
}

const groups = (blue: string[], green: string[], amber: string[]): [string, string[]][] => [
  ["Blue", blue],
  ["Green", green],
  ["Amber", amber],
];
const args = { eventName: "Spring Shoot-out", venueName: "Hillcrest Circuit" };

describe("runSheetIcs", () => {
  // Source: RFC 5545 (iCalendar) §3.8.4.7 UID, §3.8.7.4 SEQUENCE, §3.3.5 UTC "Z" times.
  const v1 = sheet(groups(["e1:1", "e3:1"], ["e2:1", "e4:1"], ["e1:2"]));

  it("one event for the briefing and one per session of each of the entry's drives, in UTC", () => {
    const cal = parse(runSheetIcs({ ...args, runSheet: v1, entryId: "e1", version: 1 }));
    expect(cal.method).toBe("PUBLISH");
    expect(cal.prodId).toBe("-//Plumbline//Run sheet//EN");
    // Briefing 08:15 BST = 07:15Z; Blue runs 1st, Amber 3rd in a 30-minute cadence from 09:00 BST
    // (08:00Z); the 7th session (12:00–12:20 BST) ends before lunch at 12:30, the 8th would
    // overlap it and moves to 13:15 BST. Hand-worked from the fixture's settings; BST = UTC+1 on
    // 2027-06-12 (IANA tz database, europe: Rule EU 1981 max, Mar lastSun to Oct lastSun).
    expect(cal.events.map((e) => [e.uid, e.start, e.end, e.sequence, e.utc])).toEqual([
      ["e1-briefing@plumbline", "2027-06-12T07:15:00.000Z", "2027-06-12T07:45:00.000Z", 1, true],
      ["e1:1-round-1@plumbline", "2027-06-12T08:00:00.000Z", "2027-06-12T08:20:00.000Z", 1, true],
      ["e1:1-round-2@plumbline", "2027-06-12T09:30:00.000Z", "2027-06-12T09:50:00.000Z", 1, true],
      ["e1:1-round-3@plumbline", "2027-06-12T11:00:00.000Z", "2027-06-12T11:20:00.000Z", 1, true],
      ["e1:2-round-1@plumbline", "2027-06-12T09:00:00.000Z", "2027-06-12T09:20:00.000Z", 1, true],
      ["e1:2-round-2@plumbline", "2027-06-12T10:30:00.000Z", "2027-06-12T10:50:00.000Z", 1, true],
      ["e1:2-round-3@plumbline", "2027-06-12T12:45:00.000Z", "2027-06-12T13:05:00.000Z", 1, true],
    ]);
    expect(cal.events[1]?.summary).toBe("Spring Shoot-out: Blue, round 1 (car 7, Ada Quill)");
  });

  it("after a move the same UIDs come back with new times and a higher SEQUENCE, so a calendar updates", () => {
    const before = parse(runSheetIcs({ ...args, runSheet: v1, entryId: "e3", version: 1 }));
    const v2 = sheet(groups(["e1:1"], ["e2:1", "e4:1", "e3:1"], ["e1:2"]));
    const after = parse(runSheetIcs({ ...args, runSheet: v2, entryId: "e3", version: 2 }));
    expect(after.events.map((e) => e.uid)).toEqual(before.events.map((e) => e.uid));
    expect(after.events.every((e) => e.sequence === 2)).toBe(true);
    // Green runs 2nd: 08:30Z in round 1 instead of Blue's 08:00Z.
    expect([before.events[1]?.start, after.events[1]?.start]).toEqual([
      "2027-06-12T08:00:00.000Z",
      "2027-06-12T08:30:00.000Z",
    ]);
    expect(after.events[1]?.summary).toBe("Spring Shoot-out: Green, round 1 (car 21)");
  });

  it("on a clock-change day the instants follow the tz rules", () => {
    // Source: IANA tz database, europe: `Rule EU 1981 max - Mar lastSun 1:00u 1:00 S` — on
    // 2027-03-28 London is on BST from 01:00Z, so the 08:15 briefing is 07:15Z and 09:00 is 08:00Z.
    const spring = sheet(groups(["e1:1", "e3:1"], ["e2:1", "e4:1"], ["e1:2"]), {
      eventDate: "2027-03-28",
    });
    const cal = parse(runSheetIcs({ ...args, runSheet: spring, entryId: "e3", version: 1 }));
    expect(cal.events.slice(0, 2).map((e) => e.start)).toEqual([
      "2027-03-28T07:15:00.000Z",
      "2027-03-28T08:00:00.000Z",
    ]);
  });

  it("refuses an entry that is not on the sheet", () => {
    expect(() => runSheetIcs({ ...args, runSheet: v1, entryId: "nobody", version: 1 })).toThrow(
      RangeError,
    );
  });
});
