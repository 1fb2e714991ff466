import { describe, expect, it } from "vitest";
import { incomingRecordSchema, RECORD_TEXT_LIMITS } from "@/lib/scrutineer/records/record-schema";
import { describeRecordIssue } from "@/lib/tech/describe-record-issue";
import { uuid7 } from "../scrutineer/fixtures";

// What the outbox shows when the server refuses a record: plain words a scrutineer can act on
// (our product rule, no outside source), never a field path or the validation library's wording.
const header = {
  id: uuid7(1),
  entryId: "car-37",
  officialId: "sam",
  deviceId: "phone-1",
  deviceTime: "2026-05-16T10:00:00+01:00",
};
const refusalOf = (raw: unknown) => {
  const parsed = incomingRecordSchema.safeParse(raw);
  if (parsed.success) throw new Error("expected a refusal");
  return describeRecordIssue(parsed.error.issues[0], raw);
};
const LIBRARY_WORDS = /payload|Too big|Too small|expected|Invalid|<=|>=/;

describe("describeRecordIssue", () => {
  it("says a comment is too long in characters, naming the comment as people do", () => {
    const message = refusalOf({
      ...header,
      kind: "checklist",
      payload: { itemId: "harness", result: "fail", comment: "x".repeat(3012) },
    });
    expect(message).toBe(
      `The comment is too long: at most ${RECORD_TEXT_LIMITS.checklistComment} characters; this one has 3012. Record it again, shorter.`,
    );
    expect(message).not.toMatch(LIBRARY_WORDS);
  });

  it("names notes, captions and void reasons the same way", () => {
    expect(refusalOf({ ...header, kind: "note", payload: { text: "y".repeat(4001) } })).toMatch(
      /^The note is too long: at most 4000 characters/,
    );
    expect(
      refusalOf({
        ...header,
        kind: "photo",
        payload: { storageKey: "k", caption: "z".repeat(501) },
      }),
    ).toMatch(/^The photo caption is too long: at most 500 characters/);
    expect(refusalOf({ ...header, kind: "note", payload: { text: "" } })).toBe(
      "The note is empty.",
    );
  });

  it("keeps the engine's own wording, which is already plain", () => {
    const message = refusalOf({
      ...header,
      kind: "reading",
      payload: {
        dimension: "wingSpanMm",
        value: -3,
        instrument: { id: "tape", name: "Tape", standardUncertainty: 0.5 },
      },
    });
    expect(message).toBe("The wing span cannot be negative.");
  });

  it("never shows the library's words for a missing or unknown part", () => {
    for (const raw of [
      { ...header, kind: "checklist", payload: { itemId: "harness", result: "maybe" } },
      { ...header, kind: "checklist", payload: { result: "pass" } },
      { ...header, deviceTime: "yesterday", kind: "note", payload: { text: "ok" } },
      { ...header, kind: "void", payload: { targetRecordId: "not-an-id", reason: "typo" } },
    ]) {
      const message = refusalOf(raw);
      expect(message).not.toMatch(LIBRARY_WORDS);
      expect(message).toMatch(/^[A-Z].*\.$/);
    }
  });
});
