import type { FieldErrors } from "@/lib/errors";
import type { RunSheetDiff } from "@/lib/paddock/diff-run-sheets";

/** What each of the clerk of course's actions answers (the contract's ClerkActionState; to be
 *  imported from lib/run-sheet/clerk-action-state.ts once that file is on main). */
export type ClerkActionState =
  | { status: "idle" }
  | { status: "error"; message: string; fields?: FieldErrors }
  | { status: "saved"; revision: number; message: string }
  | { status: "published"; version: number; diff: RunSheetDiff; mailed: number; message: string }
  | { status: "done"; message: string };

/** A clerk of course's server action, as the page receives it (app/(officials)/clerk/[eventId]/actions.ts). */
export type ClerkAction = (state: ClerkActionState, form: FormData) => Promise<ClerkActionState>;

export type ClerkActions = {
  build: ClerkAction;
  save: ClerkAction;
  publish: ClerkAction;
  callSession: ClerkAction;
  askReinspection: ClerkAction;
};

/** A FormData from plain fields, exactly as the actions list them. */
export function formOf(fields: Record<string, string>): FormData {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.set(name, value);
  return form;
}
