import type { Metadata } from "next";
import Link from "next/link";
import { forbidden, notFound } from "next/navigation";
import { Caution } from "@/components/caution";
import { DeclarationsForm } from "@/components/declarations/declarations-form";
import { getEntryDeclaringFacts } from "@/db/queries/entries/get-entry-declaring-facts";
import { getEventRuleSet } from "@/db/queries/get-event-rule-set";
import { requirePageUser } from "@/lib/auth/require-page-permission";
import { toDeclarationsFormValues } from "@/lib/declarations/declarations-form-values";
import { mayDeclare } from "@/lib/declarations/may-declare";
import { idSchema } from "@/lib/http/id-schema";
import { declarationAsks } from "@/lib/scrutineer/classes/declaration-asks";
import { storedEntryDeclarationsSchema } from "@/lib/scrutineer/classes/entry-declarations-schema";
import { saveDeclarationsAction } from "./actions";

export const metadata: Metadata = { title: "Declarations", robots: { index: false } };

// GET /entries/[entryId]/declare — what the declared class asks the entrant to declare, and why;
// the driver or car owner fills it in (the co-driver reads it).
export default async function DeclarePage({ params }: { params: Promise<{ entryId: string }> }) {
  const { entryId } = await params;
  const user = await requirePageUser(`/entries/${entryId}/declare`);
  if (!idSchema.safeParse(entryId).success) notFound();
  const facts = await getEntryDeclaringFacts({ entryId });
  if (!facts) notFound();
  if (![facts.driverId, facts.coDriverId, facts.ownerId].includes(user.id)) forbidden();
  const context = await getEventRuleSet({ eventId: facts.eventId });
  const cls = context?.ruleSet.classes.find((c) => c.id === facts.declaredClass);
  if (!context || !cls) notFound();
  const stored = storedEntryDeclarationsSchema.safeParse(facts.declarations ?? {});
  const initial = toDeclarationsFormValues(
    stored.success ? stored.data : storedEntryDeclarationsSchema.parse({}),
  );
  const closed = facts.entryStatus === "withdrawn" || facts.eventStatus === "finished";
  return (
    <div className="mx-auto max-w-2xl space-y-5">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">
          Car {facts.carNumber} · {facts.year} {facts.car} {facts.model}
        </p>
        <h1 className="text-3xl font-bold">Declarations</h1>
        <p className="text-lg text-asphalt-800">
          {facts.eventName} · entered in {cls.name}
        </p>
      </div>
      <p className="text-lg">
        {cls.name}&apos;s rules ask for what is marked below. The tech line checks what can be
        measured; what you declare here is quoted in your car&apos;s verdict. Declare honestly: a
        false declaration can exclude the car.
      </p>
      <DeclarationsForm
        entryId={entryId}
        className={cls.name}
        asks={declarationAsks(cls, context.ruleSet)}
        initial={initial}
        canEdit={mayDeclare(facts, user.id) && !closed}
        action={saveDeclarationsAction}
      />
      <Caution title="The rules">
        This page explains the event&apos;s pinned rule set in plain words. The sanctioning
        body&apos;s rulebook governs, and the chief scrutineer has the final say at the tech line.
      </Caution>
      <Link href={`/entries/${entryId}`} className="btn-secondary w-full sm:w-auto">
        Back to the entry
      </Link>
    </div>
  );
}
