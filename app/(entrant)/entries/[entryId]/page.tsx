import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import type { Metadata } from "next";
import Link from "next/link";
import { forbidden, notFound } from "next/navigation";
import { Caution } from "@/components/caution";
import { EntryResultView } from "@/components/entry-result-view";
import { EntryRunGroup } from "@/components/entry-run-group";
import { getLatestRunSheet } from "@/db/queries/run-sheets/get-latest-run-sheet";
import { requirePageUser } from "@/lib/auth/require-page-permission";
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

export const metadata: Metadata = { title: "Your entry" };

export default async function EntryPage({ params }: { params: Promise<{ entryId: string }> }) {
  const { entryId } = await params;
  const user = await requirePageUser(`/entries/${entryId}`);
  if (!idSchema.safeParse(entryId).success) notFound();
  const result = await loadEntryResult({ entryId, user }).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "forbidden") forbidden();
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  const sheet = await getLatestRunSheet({ eventId: result.eventId });
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
      <HydrationBoundary state={dehydrate(queryClient)}>
        <EntryResultView entryId={entryId} />
      </HydrationBoundary>
      <EntryRunGroup
        entryId={entryId}
        eventId={result.eventId}
        version={sheet?.version ?? null}
        publishedAtText={sheet ? formatPublishedAt(sheet.publishedAt, sheet.body.timeZone) : null}
        timeZone={sheet?.body.timeZone ?? "UTC"}
        dateText={sheet ? formatEventDate(sheet.body.eventDate) : null}
        briefingText={briefingOf(sheet)}
        drives={sheet ? entrySessions(sheet.body, entryId) : []}
      />
      <Link href={`/entries/${entryId}/pass`} className="btn-primary w-full sm:w-auto">
        Show my pass
      </Link>
      <Caution title="The result">
        Plumbline computes verdicts from the scrutineers&apos; readings and the event&apos;s rules.
        The chief scrutineer has the final say; if you disagree, ask at the tech line. A held car
        can be fixed and presented again.
      </Caution>
    </div>
  );
}

function briefingOf(sheet: { body: RunSheet } | null): string | null {
  const briefing = sheet?.body.blocks.find((b) => b.kind === "briefing");
  return sheet && briefing ? formatSessionSpan(briefing, sheet.body.timeZone) : null;
}
