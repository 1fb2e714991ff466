import type { ReactNode } from "react";
import { AttentionIcon } from "./icons/state-icons";

/** A short, plain caution. Used on the tech line, on verdicts, on the waiver and in the footer. */
export function Caution({ children, title = "Caution" }: { children: ReactNode; title?: string }) {
  return (
    <aside
      className="flex gap-3 rounded-lg border-2 border-attention-line bg-attention-soft p-3 text-attention"
      aria-label={title}
    >
      <AttentionIcon className="mt-0.5 size-6 shrink-0" />
      <div className="text-base">
        <strong className="font-semibold">{title}: </strong>
        {children}
      </div>
    </aside>
  );
}
