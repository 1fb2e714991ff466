"use client";
import { useActionState } from "react";

export type WithdrawState = { status: "idle" | "error" | "done"; message?: string };

/** The withdraw button, behind a box to tick: withdrawing gives the place away and cannot be
 *  undone from here. */
export function WithdrawForm({
  entryId,
  carNumber,
  action,
}: {
  entryId: string;
  carNumber: number;
  action: (state: WithdrawState, formData: FormData) => Promise<WithdrawState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  if (state.status === "done") {
    return (
      <p className="text-xl font-bold text-cleared" role="status" data-testid="withdraw-done">
        {state.message}
      </p>
    );
  }
  return (
    <form action={formAction} className="card space-y-4">
      <input type="hidden" name="entryId" value={entryId} />
      <label className="flex min-h-touch items-start gap-3 text-lg">
        <input type="checkbox" name="confirm" value="yes" required className="mt-1 size-6" />
        <span>
          I want to withdraw car {carNumber}. Its place goes to the next entry on the waiting list.
        </span>
      </label>
      {state.status === "error" ? (
        <p className="field-error" role="alert">
          {state.message}
        </p>
      ) : null}
      <button
        type="submit"
        className="btn-secondary w-full border-stopped text-lg"
        disabled={pending}
      >
        {pending ? "Withdrawing…" : `Withdraw car ${carNumber}`}
      </button>
    </form>
  );
}
