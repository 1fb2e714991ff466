import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import type { Metadata } from "next";
import Link from "next/link";
import { forbidden, notFound } from "next/navigation";
import { Caution } from "@/components/caution";
import { CoDriverInviteForm } from "@/components/co-driver-invite-form";
import { EntryChecklist } from "@/components/entry-checklist";
import { EntryResultView } from "@/components/entry-result-view";
import { EntryRunGroup } from "@/components/entry-run-group";
import { getEntryChecklist } from "@/db/queries/entering/get-entry-checklist";
import { getLatestRunSheet } from "@/db/queries/run-sheets/get-latest-run-sheet";
import { requirePageUser } from "@/lib/auth/require-page-permission";
import { clock } from "@/lib/clock";
import { entryChecklistSteps } from "@/lib/entries/entry-checklist-steps";
import { experienceLabels } from "@/lib/entries/experience-labels";
import { formatLapTime } from "@/lib/entries/format-lap-time";
import { loadEntryResult } from "@/lib/entries/load-entry-result";
import { AppError } from "@/lib/errors";
import { idSchema } from "@/lib/http/id-schema";
import type { RunSheet } from "@/lib/paddock/run-sheet-schema";
import { entryKeys } from "@/lib/query/entry-queries";
import { getQueryClient } from "@/lib/query/get-query-client";
import { entrySessions } from "@/lib/run-sheet/entry-sessions";
import { formatEventDate } from "@/lib/run-sheet/format-event-date";
import { formatPublishedAt } from "@/lib/run-sheet/format-published-at";
import { formatSessionSpan } from "@/lib/run-sheet/format-session-span";
import { inviteCoDriverAction } from "./actions";

export const metadata: Metadata = { title: "Your entry" };

export default async function EntryPage({
  params,
  searchParams,
}: {
  params: Promise<{ entryId: string }>;
  searchParams: Promise<{ entered?: string }>;
}) {
  const { entryId } = await params;
  const { entered } = await searchParams;
  const user = await requirePageUser(`/entries/${entryId}`);
  if (!idSchema.safeParse(entryId).success) notFound();
  const result = await loadEntryResult({ entryId, user }).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "forbidden") forbidden();
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  const now = clock.now();
  const [sheet, checklist] = await Promise.all([
    getLatestRunSheet({ eventId: result.eventId }),
    getEntryChecklist({ entryId, now }),
  ]);
  if (!checklist) notFound();
  const isDriver = checklist.drivers[0]?.userId === user.id;
  const steps = entryChecklistSteps({
    entryId,
    status: checklist.status,
    declared: checklist.declared,
    drivers: checklist.drivers,
    payment: checklist.payment,
    invite: checklist.invite,
    hasCoDriver: checklist.drivers.length > 1,
    hasPass: checklist.hasPass,
    now,
  });
  const queryClient = getQueryClient();
  queryClient.setQueryData(entryKeys.result(entryId), result);
  return (
    <div className="space-y-4">
      <div className="flex items-start gap-3">
        <span className="tabular rounded-lg bg-asphalt-950 px-3 py-2 text-4xl font-bold text-asphalt-50">
          {result.carNumber}
        </span>
        <div>
          <p className="text-base font-semibold uppercase tracking-wider text-accent">Your entry</p>
          <h1 className="text-2xl font-bold">{result.car}</h1>
          <p className="text-lg">
            {result.eventName} · entered in {result.declaredClass} · {result.drivers}
          </p>
        </div>
      </div>
      {entered ? (
        <p className="card font-semibold" role="status" data-testid="entry-received">
          Entry received. We have e-mailed you what comes next.
        </p>
      ) : null}
      <p className="card text-lg font-semibold" data-testid="entry-status">
        {checklist.status === "entered"
          ? "In the field."
          : checklist.status === "waiting"
            ? `On the waiting list: place ${checklist.waitingPlace}. You move up in order when someone withdraws.`
            : "Withdrawn."}
      </p>
      <ul className="card space-y-1" data-testid="entry-drivers">
        {checklist.drivers.map((d) => (
          <li key={d.userId}>
            <span className="font-semibold">{d.role === "driver" ? "Driver" : "Co-driver"}:</span>{" "}
            {d.name}
            {d.lapTimeEstimateMs ? ` · estimate ${formatLapTime(d.lapTimeEstimateMs)}` : ""}
            {d.experience ? ` · ${experienceLabels[d.experience].split(" — ")[0]}` : ""}
          </li>
        ))}
      </ul>
      {checklist.status === "withdrawn" ? null : (
        <section className="space-y-3">
          <h2 className="text-2xl font-bold">Your steps</h2>
          <EntryChecklist
            steps={steps}
            coDriverSlot={
              isDriver && checklist.drivers.length === 1 ? (
                <CoDriverInviteForm
                  entryId={entryId}
                  again={checklist.invite !== null}
                  action={inviteCoDriverAction}
                />
              ) : null
            }
          />
          <Link href={`/entries/${entryId}/withdraw`} className="btn-secondary">
            Withdraw this entry
          </Link>
        </section>
      )}
      {checklist.status === "withdrawn" ? (
        <p className="card" data-testid="withdrawn-note">
          This car will not run at this event.{" "}
          <Link href={`/entries/${entryId}/pay`} className="font-semibold underline">
            The entry fee and any refund
          </Link>
        </p>
      ) : checklist.status === "waiting" ? null : (
        <>
          <HydrationBoundary state={dehydrate(queryClient)}>
            <EntryResultView entryId={entryId} />
          </HydrationBoundary>
          <EntryRunGroup
            entryId={entryId}
            eventId={result.eventId}
            version={sheet?.version ?? null}
            publishedAtText={
              sheet ? formatPublishedAt(sheet.publishedAt, sheet.body.timeZone) : null
            }
            timeZone={sheet?.body.timeZone ?? "UTC"}
            dateText={sheet ? formatEventDate(sheet.body.eventDate) : null}
            briefingText={briefingOf(sheet)}
            drives={sheet ? entrySessions(sheet.body, entryId) : []}
          />
          <Link href={`/entries/${entryId}/pass`} className="btn-primary w-full sm:w-auto">
            Show my pass
          </Link>
          <Caution title="The result">
            Plumbline computes verdicts from the scrutineers&apos; readings and the event&apos;s
            rules. The chief scrutineer has the final say; if you disagree, ask at the tech line. A
            held car can be fixed and presented again.
          </Caution>
        </>
      )}
    </div>
  );
}

function briefingOf(sheet: { body: RunSheet } | null): string | null {
  const briefing = sheet?.body.blocks.find((b) => b.kind === "briefing");
  return sheet && briefing ? formatSessionSpan(briefing, sheet.body.timeZone) : null;
}
