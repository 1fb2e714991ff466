import type { z } from "zod";

/** What each part of a record is called by the people who make it. */
const SUBJECTS: ReadonlyArray<[RegExp, string]> = [
  [/^payload\.comment$/, "the comment"],
  [/^payload\.text$/, "the note"],
  [/^payload\.caption$/, "the photo caption"],
  [/^payload\.reason$/, "the reason"],
  [/^payload\.itemId$/, "the checklist item"],
  [/^payload\.result$/, "the answer (pass, fail or not fitted)"],
  [/^payload\.equipment\.standardName$/, "the standard's name"],
  [/^payload\.equipment\.standardId$/, "the standard on the label"],
  [/^payload\.equipment/, "the label"],
  [/^payload\.value$/, "the reading"],
  [/^payload\.dimension$/, "what was measured"],
  [/^payload\.corner$/, "the corner"],
  [/^payload\.instrument/, "the instrument"],
  [/^payload\.conditions/, "the measuring conditions"],
  [/^payload\.storageKey$/, "the photo's place in storage"],
  [/^payload\.targetRecordId$/, "the record to void"],
  [/^payload\.status$/, "the decision"],
  [/^payload\.classId$/, "the class"],
  [/^entryId$/, "the car"],
  [/^officialId$/, "the official"],
  [/^deviceId$/, "the phone's name"],
  [/^deviceTime$/, "the time on the record"],
  [/^id$/, "the record's number"],
  [/^kind$/, "the kind of record"],
];

// Zod's own wording starts like this; our schemas' messages are already written for people.
const LIBRARY_WORDING = /^(Invalid|Too (big|small)|Expected|Unrecognized|Required)/;

function subjectOf(path: ReadonlyArray<PropertyKey>): string {
  const key = path.filter((p) => typeof p === "string").join(".");
  return SUBJECTS.find(([re]) => re.test(key))?.[1] ?? "part of the record";
}

function valueAt(raw: unknown, path: ReadonlyArray<PropertyKey>): unknown {
  let at: unknown = raw;
  for (const key of path) {
    if (at === null || typeof at !== "object") return undefined;
    at = (at as Record<PropertyKey, unknown>)[key];
  }
  return at;
}

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
const sentence = (s: string) => (/[.!?]$/.test(s) ? s : `${s}.`);

/**
 * A record's validation problem in plain words, for the outbox and the sync answer: names the
 * part as people do ("the comment", never "payload.comment") and says what is wrong with numbers
 * a person can act on, never the validation library's wording. `raw` is the record as sent.
 */
export function describeRecordIssue(issue: z.core.$ZodIssue | undefined, raw: unknown): string {
  if (issue === undefined) return "This record is damaged on the phone and cannot be sent.";
  if (issue.code === "custom" || !LIBRARY_WORDING.test(issue.message)) {
    return sentence(capital(issue.message));
  }
  const subject = subjectOf(issue.path);
  const value = valueAt(raw, issue.path);
  switch (issue.code) {
    case "too_big":
      if (issue.origin === "string") {
        const has = typeof value === "string" ? `; this one has ${value.length}` : "";
        return `${capital(subject)} is too long: at most ${issue.maximum} characters${has}. Record it again, shorter.`;
      }
      return `${capital(subject)} is too large: at most ${issue.maximum}.`;
    case "too_small":
      if (issue.origin === "string") {
        return Number(issue.minimum) <= 1
          ? `${capital(subject)} is empty.`
          : `${capital(subject)} is too short: at least ${issue.minimum} characters.`;
      }
      return `${capital(subject)} is too small: at least ${issue.minimum}.`;
    case "invalid_type":
      return value === undefined
        ? `${capital(subject)} is missing.`
        : `${capital(subject)} is not in a form this app can read.`;
    case "unrecognized_keys":
      return "This record carries parts this version of Plumbline does not know; update the app and record it again.";
    default:
      return `${capital(subject)} is not one this app knows; update the app and record it again.`;
  }
}
