import type { ComponentType } from "react";
import {
  AttentionIcon,
  ClearedIcon,
  StoppedIcon,
  WaitingIcon,
} from "@/components/icons/state-icons";
import type { StateTone } from "./checklist-item-state";

function NotFittedIcon({ className = "size-5" }: { className?: string }) {
  return (
    <svg viewBox="0 0 24 24" className={className} aria-hidden="true">
      <circle cx="12" cy="12" r="10" fill="none" stroke="currentColor" strokeWidth="2.5" />
      <path d="M7.5 12h9" stroke="currentColor" strokeWidth="2.6" strokeLinecap="round" />
    </svg>
  );
}

type Icon = ComponentType<{ className?: string }>;
const look: Record<StateTone, { text: string; icon: Icon }> = {
  cleared: { text: "text-cleared", icon: ClearedIcon },
  attention: { text: "text-attention", icon: AttentionIcon },
  stopped: { text: "text-stopped", icon: StoppedIcon },
  waiting: { text: "text-asphalt-800", icon: WaitingIcon },
  neutral: { text: "text-asphalt-800", icon: NotFittedIcon },
};

/** A state as word + icon + colour (DESIGN.md: never colour alone). */
export function StateMark({ tone, word }: { tone: StateTone; word: string }) {
  const { text, icon: Icon } = look[tone];
  return (
    <span
      className={`inline-flex items-center gap-1 font-semibold ${text}`}
      data-testid="state-mark"
      data-tone={tone}
    >
      <Icon className="size-5 shrink-0" />
      {word}
    </span>
  );
}
