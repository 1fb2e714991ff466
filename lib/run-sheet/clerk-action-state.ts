import type { FieldErrors } from "../errors";
import type { RunSheetDiff } from "../paddock/diff-run-sheets";

/** What each of the clerk of course's actions answers (the form's state). */
export type ClerkActionState =
  | { status: "idle" }
  | { status: "error"; message: string; fields?: FieldErrors }
  | { status: "saved"; revision: number; message: string }
  | { status: "published"; version: number; diff: RunSheetDiff; mailed: number; message: string }
  | { status: "done"; message: string };
