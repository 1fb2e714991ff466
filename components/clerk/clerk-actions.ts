import type { ClerkActionState } from "@/lib/run-sheet/clerk-action-state";

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
