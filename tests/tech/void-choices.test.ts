import { describe, expect, it } from "vitest";
import { voidChoices } from "@/components/tech/void-choices";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { byOfficial, checklist, lengthReading, voidRecord } from "../scrutineer/fixtures";

const names: Record<string, string> = {
  "scrutineer-a": "Dev Patel",
  "scrutineer-b": "Sam Kowalski",
};
const list = (records: TechRecord[]) =>
  voidChoices({
    records,
    checklistLabel: (id) =>
      id === "head-restraint" ? "head restraint (HANS or similar)" : undefined,
    officialName: (id) => names[id],
    unitSystem: "mm",
    timeZone: "Europe/London",
  });

describe("voidChoices: the chief's void list", () => {
  // Two repeats of one overhang with the same value: told apart by who and when (the old list
  // showed "wing overhang 150.5 mm" twice with nothing between them).
  const records: TechRecord[] = [
    lengthReading(1, "wingOverhangMm", 150.5),
    byOfficial(lengthReading(2, "wingOverhangMm", 150.5), "scrutineer-b"),
    lengthReading(3, "wingSpanMm", 1310),
    checklist(4, { itemId: "head-restraint", result: "not-applicable" }),
    checklist(5, { itemId: "battery", result: "fail" }),
    lengthReading(6, "wingOverhangMm", 152),
    voidRecord(7, 6, "read the wrong plumb mark"),
  ];

  it("groups by kind in a fixed order, checklist last, newest first inside a group", () => {
    const groups = list(records);
    expect(groups.map((g) => g.label)).toEqual(["Wing overhang", "Wing span", "Safety checklist"]);
    // Device times are 09:0n at +01:00, i.e. 09:0n in London (BST). Source: IANA tz database.
    expect(groups[0]?.choices.map((c) => c.label)).toEqual([
      "Already void: Wing overhang 152 mm — Dev Patel, 09:06:00",
      "Wing overhang 150.5 mm — Sam Kowalski, 09:02:00",
      "Wing overhang 150.5 mm — Dev Patel, 09:01:00",
    ]);
    expect(groups[2]?.choices.map((c) => c.label)).toEqual([
      `Item "battery": fail — Dev Patel, 09:05:00`,
      "Head restraint (HANS or similar): not applicable — Dev Patel, 09:04:00",
    ]);
  });

  it("marks voided records, and a record whose void was itself voided is open again", () => {
    expect(list(records)[0]?.choices[0]?.voided).toBe(true);
    const undone = list([...records, voidRecord(8, 7, "the first reading was right")]);
    expect(undone[0]?.choices[0]).toMatchObject({ voided: false });
    expect(undone[0]?.choices[0]?.label).not.toMatch(/Already void/);
  });

  it("lists nothing for a car with no readings or answers", () => {
    expect(list([])).toEqual([]);
  });
});
