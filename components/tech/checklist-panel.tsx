"use client";
import type { TechRecord, TechRecordOf } from "@/lib/scrutineer/records/record-schema";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { ChecklistItemForm } from "./checklist-item-form";
import { useTech } from "./tech-context";

/** The safety checklist of the event's rule set. A safety failure holds the car; it never moves it up. */
export function ChecklistPanel({
  entryId,
  records,
  verdict,
}: {
  entryId: string;
  records: TechRecord[];
  verdict: Verdict | null;
}) {
  const { ruleSet } = useTech();
  return (
    <section className="space-y-3" aria-labelledby="checklist-title">
      <h2 id="checklist-title" className="text-2xl font-bold">
        Safety checklist
      </h2>
      <ul className="space-y-2">
        {ruleSet.safety.checklist.map((item) => {
          const result = verdict?.safety.find((s) => s.itemId === item.id);
          // The answer the verdict rests on: the engine names it (latest, not void).
          const answer = records.find(
            (r): r is TechRecordOf<"checklist"> =>
              r.kind === "checklist" && r.id === result?.recordId,
          );
          return (
            <ChecklistItemForm
              key={item.id}
              entryId={entryId}
              item={item}
              result={result}
              answer={answer}
            />
          );
        })}
      </ul>
    </section>
  );
}
