import { describe, expect, it } from "vitest";
import { boardSheet, sheetCars } from "./board-fixtures";

describe("shapeBoardRunSheet", () => {
  it("keeps the groups in the rotation's order with their cars in the published order", () => {
    const { body, runSheet } = boardSheet();
    expect(runSheet.version).toBe(2);
    expect(runSheet.groups.map((g) => [g.index, g.name])).toEqual([
      [1, "Group A"],
      [2, "Group B"],
      [3, "Group C"],
    ]);
    for (const [i, group] of body.groups.entries()) {
      expect(runSheet.groups[i]?.drives.map((d) => d.carNumber)).toEqual(
        group.driveIds.map((id) => body.drives.find((d) => d.driveId === id)?.carNumber),
      );
    }
    expect(runSheet.sessions).toEqual(body.sessions);
  });

  it("shows car numbers and classes only: no driver's name, key or entry id", () => {
    const { runSheet } = boardSheet();
    const text = JSON.stringify(runSheet);
    for (const car of sheetCars) {
      expect(text).not.toContain(car.driver.name);
      expect(text).not.toContain(car.driver.key);
      expect(text).not.toContain(car.entryId);
    }
    expect(runSheet.groups[0]?.drives[0]).toMatchObject({ carNumber: 7, className: "Street" });
  });

  it("gives a shared car's two drives as driver 1 and driver 2, in different groups", () => {
    // DOMAIN.md: the two drivers of one car never share a run group.
    const { runSheet } = boardSheet();
    const drives = runSheet.groups.flatMap((g) =>
      g.drives.filter((d) => d.carNumber === 11).map((d) => ({ group: g.index, ...d })),
    );
    expect(drives.map((d) => [d.slot, d.shared, d.key])).toEqual([
      [1, true, "11-1"],
      [2, true, "11-2"],
    ]);
    expect(drives[0]?.group).not.toBe(drives[1]?.group);
    const single = runSheet.groups.flatMap((g) => g.drives).find((d) => d.carNumber === 7);
    expect(single).toMatchObject({ slot: 1, shared: false });
  });

  it("flags a car held, back at the tech line or withdrawn since publication, and no other", () => {
    // common practice (no source): only a car that passed the tech line runs; a car held, sent
    // back for a re-inspection or withdrawn after the sheet went out stays off the track.
    const { runSheet } = boardSheet({ "entry-23": "held", "entry-31": "waiting" });
    const byCar = new Map(runSheet.groups.flatMap((g) => g.drives).map((d) => [d.key, d]));
    expect(byCar.get("23-1")?.flag?.kind).toBe("held");
    expect(byCar.get("31-1")?.flag?.kind).toBe("waiting");
    expect(byCar.get("31-1")?.flag?.words).toMatch(/tech line/);
    // Car 58 is not among the entered entries any more: withdrawn, with no verdict to show.
    expect(byCar.get("58-1")).toMatchObject({ status: null, flag: { kind: "withdrawn" } });
    for (const key of ["7-1", "11-1", "11-2", "42-1"]) {
      expect(byCar.get(key)).toMatchObject({ status: "cleared", flag: null });
    }
  });
});
