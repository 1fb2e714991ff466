"use client";
import { useActionState } from "react";
import type { WingPlan } from "@/lib/scrutineer/aero/wing-plan-schema";
import type { AeroPlanState } from "./aero-plan-state";

/** A saved plan as the list shows it. */
export type SavedPlanItem = { id: string; name: string; carName: string; plan: WingPlan };

type Action = (state: AeroPlanState, form: FormData) => Promise<AeroPlanState>;

function DeletePlan({ id, name, action }: { id: string; name: string; action: Action }) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  return (
    <form action={formAction}>
      <input type="hidden" name="planId" value={id} />
      <button
        type="submit"
        className="btn-secondary"
        disabled={pending}
        aria-label={`Delete the plan ${name}`}
      >
        {pending ? "Deleting…" : "Delete"}
      </button>
      {state.status === "error" ? (
        <p className="field-error" role="alert">
          {state.message}
        </p>
      ) : null}
    </form>
  );
}

/** The entrant's saved plans: open one into the form, or delete it. */
export function SavedPlanList({
  plans,
  onOpen,
  deleteAction,
}: {
  plans: ReadonlyArray<SavedPlanItem>;
  onOpen: (plan: WingPlan) => void;
  deleteAction: Action;
}) {
  return (
    <section className="space-y-3" data-testid="saved-plans">
      <h2 className="text-2xl font-bold">Your saved plans</h2>
      {plans.length === 0 ? (
        <p className="card">No saved plans yet.</p>
      ) : (
        <ul className="space-y-2">
          {plans.map((p) => (
            <li
              key={p.id}
              className="card flex flex-wrap items-center gap-3"
              data-testid="saved-plan"
            >
              <div className="min-w-0 flex-1">
                <p className="text-lg font-semibold">{p.name}</p>
                <p className="text-base text-asphalt-800">{p.carName}</p>
              </div>
              <button
                type="button"
                className="btn-secondary"
                onClick={() => onOpen(p.plan)}
                aria-label={`Open the plan ${p.name}`}
              >
                Open
              </button>
              <DeletePlan id={p.id} name={p.name} action={deleteAction} />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
