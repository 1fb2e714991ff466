import { describe, expect, it } from "vitest";
import type { RunSheetPublication } from "@/lib/paddock/run-sheet-schema";
import { shapeRunSheetPrint } from "@/lib/run-sheet/shape-run-sheet-print";
import { sheet } from "../paddock/run-sheet-fixture";

const publication = (body: RunSheetPublication["body"]): RunSheetPublication => ({
  id: "p1",
  eventId: "ev",
  version: 3,
  publishedAt: "2027-06-12T06:40:00.000Z",
  publishedBy: "clerk",
  body,
});

describe("shapeRunSheetPrint", () => {
  const body = sheet([
    ["Group A", ["e1:1", "e2:1"]],
    ["Group B", ["e1:2", "e3:1", "e4:1"]],
  ]);
  const printed = shapeRunSheetPrint(publication(body));

  it("gives one group per block in rotation order, its drives in run order", () => {
    expect(printed.version).toBe(3);
    expect(printed.groups.map((g) => [g.name, g.drives.map((d) => d.carNumber)])).toEqual([
      ["Group A", [7, 12]],
      ["Group B", [7, 21, 33]],
    ]);
    expect(printed.unplaced).toEqual([]);
  });

  it("writes every session as the venue's wall-clock time", () => {
    // Source: IANA tz database, Europe/London — BST (UTC+1) in June: the venue's clock is the
    // stored UTC instant plus one hour.
    for (const g of printed.groups) {
      const stored = body.sessions.filter((s) => s.groupIndex === g.index);
      expect(g.sessions.map((s) => s.starts)).toEqual(
        stored.map((s) => new Date(Date.parse(s.startsAt) + 3_600_000).toISOString().slice(11, 16)),
      );
      expect(g.sessions.map((s) => s.round)).toEqual(stored.map((s) => s.round));
    }
    expect(printed.briefing).not.toBeNull();
  });

  it("keeps the clock change in: the same wall times on the day summer time starts", () => {
    // Source: IANA tz database, Europe/London — clocks go forward at 01:00 UTC on Sunday
    // 28 March 2027, so a 09:00 start that day is 08:00 UTC, and the day before it is 09:00 UTC.
    const spring = shapeRunSheetPrint(
      publication(sheet([["A", ["e1:1"]]], { eventDate: "2027-03-28" })),
    );
    const before = shapeRunSheetPrint(
      publication(sheet([["A", ["e1:1"]]], { eventDate: "2027-03-27" })),
    );
    expect(spring.groups[0]?.sessions[0]?.starts).toBe(before.groups[0]?.sessions[0]?.starts);
    const springStart = sheet([["A", ["e1:1"]]], { eventDate: "2027-03-28" }).sessions[0]?.startsAt;
    const beforeStart = sheet([["A", ["e1:1"]]], { eventDate: "2027-03-27" }).sessions[0]?.startsAt;
    expect(Date.parse(springStart ?? "") - Date.parse(beforeStart ?? "")).toBe(23 * 3_600_000);
  });

  it("names a shared car's other driver and their group", () => {
    // common practice (no source): the two drivers of one car never share a run group.
    const ada = printed.groups[0]?.drives.find((d) => d.driverName === "Ada Quill");
    expect(ada?.sharedWith).toEqual({ driverName: "Ben Quill", groupName: "Group B" });
    expect(printed.groups[0]?.drives.find((d) => d.carNumber === 12)?.sharedWith).toBeNull();
  });

  it("lists a drive in no group apart", () => {
    const partial = shapeRunSheetPrint(publication(sheet([["A", ["e1:1", "e1:2", "e2:1"]]])));
    expect(partial.unplaced.map((d) => d.carNumber)).toEqual([21, 33]);
  });
});
