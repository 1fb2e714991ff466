import type { Metadata } from "next";
import { CarNumberChip } from "@/components/car-number-chip";
import { ClassTally } from "@/components/class-tally";
import { EntryList } from "@/components/entry-list";
import { EventHeading } from "@/components/event-heading";
import { AttentionIcon } from "@/components/icons/state-icons";
import { VerdictBadge } from "@/components/verdict-badge";
import { getEventRuleSet } from "@/db/queries/get-event-rule-set";
import { listEventEntries } from "@/db/queries/list-event-entries";
import { listRegistrationStatus } from "@/db/queries/list-registration-status";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { isReadyToRun } from "@/lib/entries/ready-to-run";
import { signOnState } from "@/lib/entries/sign-on-state";
import { toEntryListRow } from "@/lib/entries/to-entry-list-row";

export const metadata: Metadata = { title: "Clerk of course" };

// GET /clerk/[eventId] — the cars the clerk of course may put in run groups: cleared at the tech
// line AND signed on. Cleared cars still missing a signature or the fee are listed apart, with why.
export default async function ClerkPage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "run-groups.write",
    returnTo: `/clerk/${eventId}`,
  });
  const [all, registration, rules] = await Promise.all([
    listEventEntries({ eventId }),
    listRegistrationStatus({ eventId }),
    getEventRuleSet({ eventId }),
  ]);
  const ladder = rules?.ruleSet.classes.map((c) => c.name) ?? [];
  const cleared = all
    .filter((row) => row.status === "cleared" || row.status === "moved-up")
    .map((row) => ({
      ...toEntryListRow(row),
      signOn: signOnState(registration.get(row.entryId) ?? { waiver: "missing", paid: false }),
    }));
  const ready = cleared.filter((row) => isReadyToRun(row.status, row.signOn));
  const notSignedOn = cleared.filter((row) => !row.signOn.signedOn);
  return (
    <div className="space-y-4">
      <EventHeading roleLabel="Clerk of course" title="Ready to run" event={event}>
        <p className="text-lg" data-testid="ready-summary">
          <strong className="tabular">{ready.length}</strong> of{" "}
          <span className="tabular">{all.length}</span> cars are ready to run: cleared at the tech
          line and signed on. Only these go into run groups.
        </p>
      </EventHeading>
      {notSignedOn.length > 0 ? (
        <section
          className="rounded-xl border-2 border-attention-line bg-attention-soft p-4 text-attention"
          aria-labelledby="not-signed-on-heading"
          data-testid="cleared-not-signed-on"
        >
          <h2 id="not-signed-on-heading" className="flex items-center gap-2 text-xl font-bold">
            <AttentionIcon className="size-6 shrink-0" />
            Cleared, but not signed on: keep out of run groups
          </h2>
          <ul className="mt-2 space-y-2">
            {notSignedOn.map((row) => (
              <li
                key={row.entryId}
                className="flex flex-wrap items-center gap-x-3 gap-y-1 text-lg"
                data-car-number={row.carNumber}
              >
                <CarNumberChip carNumber={row.carNumber} small />
                <VerdictBadge status={row.status} toClass={row.finalClass} />
                <span className="font-semibold">{row.signOn.missing.join("; ")}.</span>
              </li>
            ))}
          </ul>
          <p className="mt-2 text-base">The sign-on desk clears these; they then join the list.</p>
        </section>
      ) : null}
      <section className="space-y-3" aria-labelledby="ready-heading">
        <h2 id="ready-heading" className="text-2xl font-bold">
          Ready to run by class, low to high
        </h2>
        <ClassTally
          classNames={ready.map((row) => row.finalClass ?? row.declaredClass)}
          ladder={ladder}
          testId="ready-by-class"
        />
        <EntryList rows={ready} emptyText="No car is ready to run yet." />
      </section>
    </div>
  );
}
