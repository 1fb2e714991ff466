import { describe, expect, it } from "vitest";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { recordRefusal } from "@/lib/tech/record-refusal";
import { uuid7 } from "../scrutineer/fixtures";

// The void rule of the tech line (our own product rule, no outside source): records are
// immutable; a scrutineer takes back their own record with a void, and only the chief
// scrutineer voids another official's.
const voidOf = (targetRecordId: string, officialId = "sam"): TechRecord => ({
  id: uuid7(100),
  kind: "void",
  entryId: "car-37",
  officialId,
  deviceId: "phone-1",
  deviceTime: "2026-05-16T10:00:00+01:00",
  payload: { targetRecordId, reason: "typed 0 for 150" },
});
const target = uuid7(1);

describe("recordRefusal", () => {
  it("lets a scrutineer void their own record of the same car", () => {
    expect(
      recordRefusal({
        record: voidOf(target),
        userId: "sam",
        roles: ["scrutineer"],
        target: { kind: "reading", entryId: "car-37", officialId: "sam" },
      }),
    ).toBeNull();
  });

  it("refuses a scrutineer's void of another official's record, saying who can", () => {
    const reason = recordRefusal({
      record: voidOf(target),
      userId: "sam",
      roles: ["scrutineer"],
      target: { kind: "reading", entryId: "car-37", officialId: "alex" },
    });
    expect(reason).toMatch(/only your own records/);
    expect(reason).toMatch(/chief scrutineer/);
  });

  it("refuses a scrutineer's void of a record the server does not have, or of another car", () => {
    expect(
      recordRefusal({ record: voidOf(target), userId: "sam", roles: ["scrutineer"], target: null }),
    ).toMatch(/not on the server/);
    expect(
      recordRefusal({
        record: voidOf(target),
        userId: "sam",
        roles: ["scrutineer"],
        target: { kind: "reading", entryId: "car-12", officialId: "sam" },
      }),
    ).toMatch(/another car/);
  });

  it("lets the chief scrutineer void anyone's record", () => {
    expect(
      recordRefusal({
        record: voidOf(target, "chief"),
        userId: "chief",
        roles: ["chief-scrutineer"],
        target: { kind: "reading", entryId: "car-37", officialId: "alex" },
      }),
    ).toBeNull();
  });

  it("lets only the chief scrutineer void a void, even the scrutineer's own void", () => {
    // A void of a void undoes the first void; undoing is the chief's call, never a scrutineer's.
    const ownVoid = { kind: "void" as const, entryId: "car-37", officialId: "sam" };
    expect(
      recordRefusal({
        record: voidOf(target),
        userId: "sam",
        roles: ["scrutineer"],
        target: ownVoid,
      }),
    ).toMatch(/Only the chief scrutineer can undo a void/);
    expect(
      recordRefusal({
        record: voidOf(target, "chief"),
        userId: "chief",
        roles: ["chief-scrutineer"],
        target: ownVoid,
      }),
    ).toBeNull();
  });

  it("refuses a void from a role that records nothing, and any record under another sign-in", () => {
    expect(
      recordRefusal({
        record: voidOf(target, "clerk"),
        userId: "clerk",
        roles: ["clerk-of-course"],
        target: { kind: "reading", entryId: "car-37", officialId: "clerk" },
      }),
    ).toBe("Your role in this event cannot void records.");
    expect(
      recordRefusal({
        record: voidOf(target, "alex"),
        userId: "sam",
        roles: ["chief-scrutineer"],
        target: null,
      }),
    ).toMatch(/another official's sign-in/);
  });

  it("words a missing permission for each kind of record as an action", () => {
    const override: TechRecord = {
      ...voidOf(target),
      kind: "override",
      payload: { status: "held", classId: null, reason: "wing mount cracked" },
    };
    expect(
      recordRefusal({ record: override, userId: "sam", roles: ["scrutineer"], target: null }),
    ).toBe("Your role in this event cannot override verdicts.");
  });
});
