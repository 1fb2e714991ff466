"use client";
import { useActionState } from "react";
import { FieldError } from "@/components/field-error";
import type { WingPlan } from "@/lib/scrutineer/aero/wing-plan-schema";
import type { AeroPlanState } from "./aero-plan-state";

/** One of the entrant's cars, as the save form offers it. */
export type PlanCar = { id: string; name: string };

/** "Save this plan against a car": one of the entrant's own cars and a name. */
export function SavePlanForm({
  plan,
  cars,
  action,
}: {
  plan: WingPlan;
  cars: ReadonlyArray<PlanCar>;
  action: (state: AeroPlanState, form: FormData) => Promise<AeroPlanState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  const fields = state.status === "error" ? state.fields : undefined;
  if (cars.length === 0) {
    return (
      <p className="card">
        Add a car to <a href="/garage">your garage</a> to save this plan against it.
      </p>
    );
  }
  return (
    <form action={formAction} className="card space-y-3" data-testid="save-plan-form">
      <h2 className="text-xl font-bold">Save this plan against a car</h2>
      <input type="hidden" name="plan" value={JSON.stringify(plan)} />
      <div>
        <label htmlFor="save-plan-car" className="field-label">
          Car
        </label>
        <select id="save-plan-car" name="carId" className="field-input">
          {cars.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </select>
        <FieldError id="save-plan-car-error" messages={fields?.carId} />
      </div>
      <div>
        <label htmlFor="save-plan-name" className="field-label">
          Name of the plan
        </label>
        <input
          id="save-plan-name"
          name="name"
          className="field-input"
          maxLength={80}
          required
          defaultValue="Rear wing"
        />
        <FieldError id="save-plan-name-error" messages={fields?.name} />
      </div>
      {state.status === "error" && !fields ? (
        <p className="field-error" role="alert">
          {state.message}
        </p>
      ) : null}
      {state.status === "done" ? (
        <p className="font-semibold text-cleared" role="status">
          {state.message}
        </p>
      ) : null}
      <button type="submit" className="btn-primary" disabled={pending}>
        {pending ? "Saving…" : "Save the plan"}
      </button>
    </form>
  );
}
