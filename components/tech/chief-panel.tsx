"use client";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { ChiefOverrideForm } from "./chief-override-form";
import { ChiefVoidForm } from "./chief-void-form";
import { useTech } from "./tech-context";

/**
 * The chief scrutineer's decisions, each an immutable record with a written reason: void a
 * reading (it stays on file, struck through) or override the computed verdict.
 */
export function ChiefPanel({
  entryId,
  records,
  verdict,
}: {
  entryId: string;
  records: TechRecord[];
  verdict: Verdict | null;
}) {
  const { pack } = useTech();
  const entry = pack.entries.find((e) => e.entryId === entryId);
  return (
    <section
      className="space-y-6 rounded-xl border-4 border-attention-line bg-attention-soft p-4"
      aria-labelledby="chief-title"
      data-testid="chief-panel"
    >
      <h2 id="chief-title" className="text-2xl font-bold">
        Chief scrutineer
      </h2>
      {verdict?.flags.includes("disagreement") ? (
        <p className="font-semibold">
          Readings of this car disagree beyond their uncertainty. Void the reading you reject, or
          re-measure.
        </p>
      ) : null}
      <ChiefVoidForm entryId={entryId} records={records} />
      {entry ? (
        <ChiefOverrideForm
          entryId={entryId}
          declaredClassId={entry.declaredClassId}
          verdict={verdict}
        />
      ) : null}
    </section>
  );
}
