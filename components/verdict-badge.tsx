import type { ReactNode } from "react";
import { type VerdictWord, verdictLabels } from "@/lib/verdict-word";
import {
  AttentionIcon,
  ClearedIcon,
  MovedUpIcon,
  StoppedIcon,
  WaitingIcon,
} from "./icons/state-icons";

const look: Record<VerdictWord, { className: string; icon: ReactNode }> = {
  waiting: {
    className: "bg-asphalt-100 text-asphalt-900 border-asphalt-400",
    icon: <WaitingIcon />,
  },
  cleared: {
    className: "bg-cleared-soft text-cleared border-cleared-line",
    icon: <ClearedIcon />,
  },
  "moved-up": {
    className: "bg-cleared-soft text-cleared border-cleared-line",
    icon: <MovedUpIcon />,
  },
  "re-measure": {
    className: "bg-attention-soft text-attention border-attention-line",
    icon: <AttentionIcon />,
  },
  held: {
    className: "bg-stopped-soft text-stopped border-stopped-line",
    icon: <StoppedIcon />,
  },
};

/** A verdict as word + icon + colour (never colour alone). */
export function VerdictBadge({
  status,
  toClass,
}: {
  status: VerdictWord;
  toClass?: string | null;
}) {
  const { className, icon } = look[status];
  const label = verdictLabels[status];
  return (
    <span
      className={`inline-flex items-center gap-1.5 rounded-full border-2 px-3 py-1 text-base font-semibold ${className}`}
      data-testid="verdict-badge"
      data-status={status}
    >
      {icon}
      {label}
      {status === "moved-up" && toClass ? <span>→ {toClass}</span> : null}
    </span>
  );
}
