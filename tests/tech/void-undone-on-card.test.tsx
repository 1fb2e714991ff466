import type { ReactElement } from "react";
import { describe, expect, it } from "vitest";
import { PhotosNotesPanel } from "@/components/tech/photos-notes-panel";
import { TechContext, type TechContextValue } from "@/components/tech/tech-context";
import { demoRuleSet } from "@/db/seed/demo-rule-set";
import type { StoredPack } from "@/lib/offline/save-event-pack";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { resolveRecords } from "@/lib/scrutineer/records/resolve-records";
import { partByTestId, render, textOf } from "../diagrams/render-markup";
import { note, voidRecord } from "../scrutineer/fixtures";

// The void rule is our own product rule (no outside source): a void of a void undoes the
// first void, in the verdict and on every screen of the car card alike (issue 8, item 15).

const pack = {
  event: {
    id: "event-1",
    name: "Test day",
    eventDate: "2026-05-16",
    timeZone: "Europe/London",
    unitSystem: "mm",
    venueName: "Test circuit",
  },
  officials: [{ userId: "scrutineer-a", name: "Sam Reade" }],
  entries: [],
  records: [],
  verdicts: [],
} as unknown as StoredPack;

function withTech(element: ReactElement): string {
  const value: TechContextValue = {
    eventId: "event-1",
    official: { id: "scrutineer-a", name: "Sam Reade" },
    deviceId: "phone-1",
    canWrite: true,
    canChief: false,
    pack,
    ruleSet: demoRuleSet,
    local: [],
    record: async () => {},
  };
  return render(<TechContext.Provider value={value}>{element}</TechContext.Provider>);
}

const notes = (records: TechRecord[]) =>
  textOf(
    partByTestId(withTech(<PhotosNotesPanel entryId="entry-1" records={records} />), "note-list"),
  );

describe("the car card follows the engine's void rule", () => {
  const loose = note(1, "Battery clamp loose");
  const voided = voidRecord(2, 1, "wrong car");

  it("strikes through a note its void cancels", () => {
    expect(resolveRecords([loose, voided], "entry-1").counts.voided).toBe(1);
    expect(notes([loose, voided])).toMatch(/void: wrong car/);
  });

  it("shows a note again once its void is itself voided, as the verdict counts it", () => {
    const undone = [loose, voided, voidRecord(3, 2, "the note was right")];
    expect(resolveRecords(undone, "entry-1").inspectionRecords).toBe(1);
    const text = notes(undone);
    expect(text).toMatch(/Battery clamp loose/);
    expect(text).not.toMatch(/void:/);
  });
});
