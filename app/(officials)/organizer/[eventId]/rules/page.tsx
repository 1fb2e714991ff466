import type { Metadata } from "next";
import Link from "next/link";
import { EventHeading } from "@/components/event-heading";
import { PinRuleSetForm } from "@/components/rules/pin-rule-set-form";
import { ReEvaluationView } from "@/components/rules/re-evaluation-view";
import { RuleSetDescriptionView } from "@/components/rules/rule-set-description";
import { RuleSetEditor } from "@/components/rules/rule-set-editor";
import { RuleSetVersionList } from "@/components/rules/rule-set-version-list";
import { getRuleSetVersion } from "@/db/queries/get-rule-set-version";
import { listRuleSetVersions } from "@/db/queries/list-rule-set-versions";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { idSchema } from "@/lib/http/id-schema";
import { previewRuleSetChange } from "@/lib/rule-sets/preview-rule-set-change";
import { describeRuleSet } from "@/lib/scrutineer/rule-sets/describe-rule-set";
import { ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { displayUnits } from "@/lib/scrutineer/units/display-units";
import { draftRuleSetAction, pinRuleSetAction } from "./actions";

export const metadata: Metadata = { title: "Class rules" };

/** The counts a pin redirect carries, shown only while that version is still the pinned one. */
function pinnedOutcome(
  query: { pinned?: string; changed?: string; mailed?: string },
  pinnedVersion: number,
): { changed: number; mailed: number } | null {
  const count = (v: string | undefined) =>
    v !== undefined && /^\d{1,6}$/.test(v) ? Number(v) : null;
  const changed = count(query.changed);
  const mailed = count(query.mailed);
  if (count(query.pinned) !== pinnedVersion || changed === null || mailed === null) return null;
  return { changed, mailed };
}

export default async function RuleSetPage({
  params,
  searchParams,
}: {
  params: Promise<{ eventId: string }>;
  searchParams: Promise<{ version?: string; pinned?: string; changed?: string; mailed?: string }>;
}) {
  const { eventId } = await params;
  const query = await searchParams;
  const versionParam = query.version;
  const { event } = await loadEventPage({
    eventId,
    permission: "rule-sets.manage",
    returnTo: `/organizer/${eventId}/rules`,
  });
  const display = displayUnits({ length: event.unitSystem });
  const versions = await listRuleSetVersions({ eventId });
  const pinnedRow = versions.find((v) => v.pinned);
  const pinned = pinnedRow ? await getRuleSetVersion({ eventId, versionId: pinnedRow.id }) : null;
  const latest = versions[0]
    ? await getRuleSetVersion({ eventId, versionId: versions[0].id })
    : null;
  const pinnedRuleSet = ruleSetSchema.parse(pinned?.body);
  const latestRuleSet = ruleSetSchema.parse(latest?.body ?? pinned?.body);
  const nextVersion = (versions[0]?.version ?? pinnedRuleSet.version) + 1;

  const justPinned = pinnedOutcome(query, pinnedRuleSet.version);
  const reviewId = idSchema.safeParse(versionParam).success ? versionParam : undefined;
  const reviewRow = versions.find((v) => v.id === reviewId && !v.pinned);
  const review = reviewRow ? await getRuleSetVersion({ eventId, versionId: reviewRow.id }) : null;
  const reviewRuleSet = review ? ruleSetSchema.parse(review.body) : null;
  const reviewPreview = reviewRuleSet
    ? await previewRuleSetChange({ eventId, candidate: reviewRuleSet })
    : null;

  return (
    <div className="space-y-8">
      <EventHeading roleLabel="Organizer" title="Class rules" event={event}>
        <p className="text-lg">
          Judged by <strong>{pinnedRuleSet.name}</strong>, version {pinnedRuleSet.version}.
        </p>
        <div className="flex flex-wrap gap-2">
          <Link href={`/organizer/${eventId}`} className="btn-secondary">
            The event
          </Link>
          <a
            href={`/api/events/${eventId}/rule-sets/${pinnedRow?.id ?? ""}`}
            className="btn-secondary"
            download
          >
            Download version {pinnedRuleSet.version} (JSON)
          </a>
        </div>
      </EventHeading>

      {justPinned ? (
        <p
          className="rounded-lg border-2 border-cleared-line bg-cleared-soft p-3 text-lg font-semibold text-cleared"
          role="status"
        >
          Version {pinnedRuleSet.version} is pinned. {justPinned.changed}{" "}
          {justPinned.changed === 1 ? "verdict" : "verdicts"} changed; {justPinned.mailed}{" "}
          {justPinned.mailed === 1 ? "e-mail" : "e-mails"} on their way to drivers. Phones use it
          once their event pack is refreshed.
        </p>
      ) : null}

      {reviewRow && reviewRuleSet && reviewPreview ? (
        <section className="space-y-4" data-testid="rule-set-review">
          <h2 className="text-2xl font-bold">Version {reviewRow.version}, saved, not pinned</h2>
          {reviewRow.notes ? <p className="text-lg">“{reviewRow.notes}”</p> : null}
          <ReEvaluationView preview={reviewPreview} />
          <PinRuleSetForm
            eventId={eventId}
            versionId={reviewRow.id}
            version={reviewRow.version}
            action={pinRuleSetAction}
          />
          <details className="card">
            <summary className="min-h-touch cursor-pointer py-2 font-semibold">
              Version {reviewRow.version} in words
            </summary>
            <RuleSetDescriptionView description={describeRuleSet(reviewRuleSet, display)} />
          </details>
        </section>
      ) : null}

      <section className="space-y-3">
        <h2 className="text-2xl font-bold">The class ladder, low to high</h2>
        <RuleSetDescriptionView description={describeRuleSet(pinnedRuleSet, display)} />
      </section>

      <section className="space-y-3">
        <h2 className="text-2xl font-bold">Versions</h2>
        <RuleSetVersionList eventId={eventId} versions={versions} />
      </section>

      <RuleSetEditor
        eventId={eventId}
        nextVersion={nextVersion}
        initialText={JSON.stringify({ ...latestRuleSet, version: nextVersion }, null, 2)}
        action={draftRuleSetAction}
      />
    </div>
  );
}
