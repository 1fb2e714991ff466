import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { runSheetCsv } from "@/lib/run-sheet/run-sheet-csv";
import { drive, drives, sheet } from "../paddock/run-sheet-fixture";

/** Reads the CSV back with csv-parse (a separate parser of the same family as csv-stringify). */
const read = (text: string) =>
  parse(text, { columns: true, record_delimiter: "\r\n" }) as Record<string, string>[];

const groups = (blue: string[], green: string[], amber: string[]): [string, string[]][] => [
  ["Blue", blue],
  ["Green", green],
  ["Amber", amber],
];

describe("runSheetCsv", () => {
  it("one row per drive in rotation and run order, with each round's local start and offset", () => {
    const text = runSheetCsv(sheet(groups(["e3:1", "e1:1"], ["e2:1", "e4:1"], ["e1:2"])));
    // Source: RFC 4180 §2 — records end in CRLF, the first line may be a header.
    expect(text.split("\r\n")[0]).toBe(
      "Group,Run order,Car,Driver,Class,Experience,Lap estimate,Round 1 start,Round 2 start,Round 3 start",
    );
    const rows = read(text);
    expect(rows.map((r) => [r.Group, r["Run order"], r.Car, r.Driver])).toEqual([
      ["Blue", "1", "21", "Dev Ostrander"],
      ["Blue", "2", "7", "Ada Quill"],
      ["Green", "1", "12", "Cleo Marsh"],
      ["Green", "2", "33", "Eli Fenwick"],
      ["Amber", "1", "7", "Ben Quill"],
    ]);
    // Source: ISO 8601-1:2019 §5.3.4 (local time with its difference from UTC); BST = UTC+1 on
    // 2027-06-12 (IANA tz database, europe: Rule EU 1981 max). Blue 1st, Amber 3rd every 30 min
    // from 09:00; in round 3 Green's 12:30 would overlap lunch (12:30–13:15), so Green starts at
    // 13:15 and Amber at 13:45 (fixture settings).
    expect(rows[1]).toEqual({
      Group: "Blue",
      "Run order": "2",
      Car: "7",
      Driver: "Ada Quill",
      Class: "Street",
      Experience: "Advanced",
      "Lap estimate": "1:38.250",
      "Round 1 start": "2027-06-12T09:00:00+01:00",
      "Round 2 start": "2027-06-12T10:30:00+01:00",
      "Round 3 start": "2027-06-12T12:00:00+01:00",
    });
    expect(rows[0]?.["Lap estimate"]).toBe("");
    expect(rows[4]?.["Round 3 start"]).toBe("2027-06-12T13:45:00+01:00");
  });

  it("tells the two 01:00s apart on the night New York's clocks go back", () => {
    // Source: IANA tz database, northamerica: `Rule US 2007 max - Nov Sun>=1 2:00 0 S` — on
    // 2027-11-07 02:00 EDT (06:00Z) becomes 01:00 EST. Sessions every 30 minutes from the first
    // 01:00 (EDT, RFC 5545 §3.3.5): 01:00 EDT, 01:30 EDT, then 06:00Z, which is 01:00 EST.
    const night = sheet(groups(["e1:1"], ["e2:1"], ["e3:1"]), {
      timeZone: "America/New_York",
      eventDate: "2027-11-07",
      settings: {
        dayStart: "01:00",
        dayEnd: "06:00",
        sessionMinutes: 20,
        gapMinutes: 10,
        lunch: null,
        rounds: 1,
        briefing: null,
      },
      drives: drives.filter((d) => ["e1:1", "e2:1", "e3:1"].includes(d.driveId)),
    });
    expect(read(runSheetCsv(night)).map((r) => r["Round 1 start"])).toEqual([
      "2027-11-07T01:00:00-04:00",
      "2027-11-07T01:30:00-04:00",
      "2027-11-07T01:00:00-05:00",
    ]);
  });

  it("keeps a typed name from running as a spreadsheet formula, and quotes commas", () => {
    // Source: OWASP, CSV injection — prefix cells starting with = + - @ with an apostrophe.
    const odd = drive("e9", 1, 99, '=HYPERLINK("x"), Jr');
    const text = runSheetCsv(sheet(groups(["e9:1"], [], []), { drives: [odd] }));
    expect(read(text)[0]?.Driver).toBe('\'=HYPERLINK("x"), Jr');
  });
});
