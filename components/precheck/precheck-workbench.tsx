"use client";
import { useEffect, useMemo, useState } from "react";
import { keepPageForOffline } from "@/lib/offline/keep-page-for-offline";
import {
  type WingPlanFormValues,
  wingPlanToFormValues,
} from "@/lib/precheck/wing-plan-form-schema";
import { precheckWingPlan } from "@/lib/scrutineer/aero/precheck-wing-plan";
import { wingPlanDimensions } from "@/lib/scrutineer/aero/wing-plan-dimensions";
import type { WingPlan } from "@/lib/scrutineer/aero/wing-plan-schema";
import type { RuleSet } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import type { AeroPlanState } from "./aero-plan-state";
import { ClassFitCard } from "./class-fit-card";
import { type PlanCar, SavePlanForm } from "./save-plan-form";
import { type SavedPlanItem, SavedPlanList } from "./saved-plan-list";
import { blankPlanForm, WingPlanForm } from "./wing-plan-form";

/** An event whose rule set the pre-check can use; the rule set comes with the page. */
export type PrecheckEventOption = {
  slug: string;
  name: string;
  eventDate: string;
  unitSystem: "mm" | "in";
  ruleSet: RuleSet;
};

type Action = (state: AeroPlanState, form: FormData) => Promise<AeroPlanState>;

/**
 * The pre-check: choose an event's rule set, describe the car and the planned wing, and see
 * every class of the ladder with its margins and envelope. Everything is worked out in the
 * browser from the rule sets the page brought, so it keeps working with no signal.
 */
export function PrecheckWorkbench({
  events,
  defaultSlug,
  entrant,
  saveAction,
  deleteAction,
}: {
  events: ReadonlyArray<PrecheckEventOption>;
  defaultSlug: string;
  entrant: { cars: PlanCar[]; plans: SavedPlanItem[] } | null;
  saveAction: Action;
  deleteAction: Action;
}) {
  const [slug, setSlug] = useState(defaultSlug);
  const event = events.find((e) => e.slug === slug) ?? events[0];
  const [values, setValues] = useState<WingPlanFormValues>(() =>
    blankPlanForm(event?.unitSystem ?? "mm"),
  );
  const [plan, setPlan] = useState<WingPlan | null>(null);

  // The page itself, kept for a reload with no signal from the first visit on; and the event
  // named in the address, also when the page came from that copy.
  useEffect(() => {
    void keepPageForOffline("/pre-check").catch(() => undefined);
    const named = new URLSearchParams(window.location.search).get("event");
    if (named && events.some((e) => e.slug === named)) setSlug(named);
  }, [events]);

  const chooseEvent = (next: string) => {
    setSlug(next);
    const url = new URL(window.location.href);
    url.searchParams.set("event", next);
    window.history.replaceState(null, "", url);
  };

  const fits = useMemo(
    () => (plan && event ? precheckWingPlan({ plan, ruleSet: event.ruleSet }) : null),
    [plan, event],
  );
  const dimensions = useMemo(
    () => (plan && event ? wingPlanDimensions(plan, event.ruleSet.decisionRule.k) : []),
    [plan, event],
  );
  const spanUnit = plan
    ? plan.wing.span.kind === "whole"
      ? plan.wing.span.span.unit
      : plan.wing.span.half.unit
    : "mm";

  if (!event) {
    return <p className="card">No upcoming event has a rule set to check against yet.</p>;
  }
  return (
    <div className="space-y-6">
      <div className="card">
        <label htmlFor="precheck-event" className="field-label">
          Check against the classes of
        </label>
        <select
          id="precheck-event"
          className="field-input"
          value={event.slug}
          onChange={(e) => chooseEvent(e.target.value)}
        >
          {events.map((e) => (
            <option key={e.slug} value={e.slug}>
              {e.name} · {e.eventDate}
            </option>
          ))}
        </select>
        <p className="mt-2 text-base text-asphalt-800">
          Rule set: {event.ruleSet.name} (version {event.ruleSet.version})
        </p>
      </div>
      {entrant ? (
        <SavedPlanList
          plans={entrant.plans}
          onOpen={(saved) => {
            setValues(wingPlanToFormValues(saved));
            setPlan(saved);
          }}
          deleteAction={deleteAction}
        />
      ) : null}
      <WingPlanForm values={values} onPlan={setPlan} />
      {fits && plan ? (
        <section className="space-y-3" aria-live="polite">
          <h2 className="text-2xl font-bold">Class by class</h2>
          <p className="text-base">
            A plan is exact; a car measured at the tech line carries the uncertainty of the tape, so
            leave room near a limit. The rule set and the chief scrutineer on the day decide.
          </p>
          <ul className="space-y-4" data-testid="class-fits">
            {fits.map((fit) => {
              const cls = event.ruleSet.classes.find((c) => c.id === fit.classId);
              return cls ? (
                <ClassFitCard
                  key={fit.classId}
                  fit={fit}
                  cls={cls}
                  dimensions={dimensions}
                  unit={spanUnit}
                />
              ) : null;
            })}
          </ul>
          {entrant ? <SavePlanForm plan={plan} cars={entrant.cars} action={saveAction} /> : null}
        </section>
      ) : null}
    </div>
  );
}
