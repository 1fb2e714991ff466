"use client";
import { useActionState } from "react";

export type PayState = { status: "idle" | "error"; message?: string };

/** "Pay" on the entry-fee page: the server action opens a checkout and sends the browser to it. */
export function PayForm({
  entryId,
  amountText,
  again,
  action,
}: {
  entryId: string;
  amountText: string;
  again: boolean;
  action: (state: PayState, formData: FormData) => Promise<PayState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  return (
    <form action={formAction} className="space-y-3">
      <input type="hidden" name="entryId" value={entryId} />
      {state.status === "error" ? (
        <p className="field-error" role="alert">
          {state.message}
        </p>
      ) : null}
      <button type="submit" className="btn-primary w-full text-lg" disabled={pending}>
        {pending ? "Opening the checkout…" : `${again ? "Try again: pay" : "Pay"} ${amountText}`}
      </button>
    </form>
  );
}
