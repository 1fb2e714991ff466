import Link from "next/link";
import type { ChecklistStep } from "@/lib/entries/entry-checklist-steps";

const stateWords: Record<ChecklistStep["state"], { icon: string; word: string; tone: string }> = {
  done: { icon: "✓", word: "Done", tone: "text-cleared" },
  "to-do": { icon: "○", word: "To do", tone: "text-asphalt-800" },
  waiting: { icon: "…", word: "Waiting", tone: "text-attention" },
  problem: { icon: "✗", word: "Needs you", tone: "text-stopped" },
};

/** The entrant's steps in order, each with its state (word and icon) and where to do it. */
export function EntryChecklist({
  steps,
  coDriverSlot,
}: {
  steps: ChecklistStep[];
  coDriverSlot?: React.ReactNode;
}) {
  return (
    <ol className="space-y-2" data-testid="entry-checklist">
      {steps.map((step) => {
        const look = stateWords[step.state];
        return (
          <li
            key={step.key}
            className="card space-y-2"
            data-testid={`step-${step.key}`}
            data-state={step.state}
          >
            <div className="flex items-start gap-3">
              <span className={`text-2xl font-bold ${look.tone}`} aria-hidden="true">
                {look.icon}
              </span>
              <div className="min-w-0 flex-1">
                <p className="text-lg font-semibold">{step.title}</p>
                <p className={`text-base font-semibold ${look.tone}`}>{look.word}</p>
                <p className="text-base">{step.words}</p>
              </div>
              {step.href ? (
                <Link
                  href={step.href}
                  className="btn-secondary min-w-touch shrink-0"
                  aria-label={`${step.title}: open`}
                >
                  Open
                </Link>
              ) : null}
            </div>
            {step.key === "co-driver" ? coDriverSlot : null}
          </li>
        );
      })}
    </ol>
  );
}
