import type { ReactNode } from "react";
import { AttentionIcon } from "@/components/icons/state-icons";

/**
 * The car card's hold before a reading is saved: a heading in the attention state, why, and the
 * choice of fixing it or saving it anyway — a warning, never a refusal. Shared by the reading
 * that cannot be true and the reading that disagrees with the scrutineer's own.
 */
export function CheckBeforeSaving(props: {
  testId: string;
  heading: ReactNode;
  children: ReactNode;
  onSaveAnyway: () => void;
  onFix: () => void;
}) {
  return (
    <div
      className="space-y-3 rounded-lg border-2 border-attention-line bg-attention-soft p-3 text-attention"
      role="alert"
      data-testid={props.testId}
    >
      <p className="flex gap-2 text-lg font-semibold">
        <AttentionIcon className="mt-0.5 size-6 shrink-0" />
        {props.heading}
      </p>
      {props.children}
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn-primary" onClick={props.onFix}>
          Fix it
        </button>
        <button type="button" className="btn-secondary" onClick={props.onSaveAnyway}>
          Save anyway
        </button>
      </div>
    </div>
  );
}
