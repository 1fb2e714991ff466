import type { ReactNode } from "react";
import { AttentionIcon, ClearedIcon, StoppedIcon, WaitingIcon } from "../../icons/state-icons";
import type { OutcomeLook } from "./outcome-look";

const LOOK: Record<OutcomeLook["state"], { className: string; icon: ReactNode }> = {
  inside: { className: "bg-cleared-soft text-cleared border-cleared-line", icon: <ClearedIcon /> },
  over: { className: "bg-stopped-soft text-stopped border-stopped-line", icon: <StoppedIcon /> },
  unsure: {
    className: "bg-attention-soft text-attention border-attention-line",
    icon: <AttentionIcon />,
  },
  waiting: {
    className: "bg-asphalt-100 text-asphalt-900 border-asphalt-400",
    icon: <WaitingIcon />,
  },
  unlimited: {
    className: "bg-asphalt-100 text-asphalt-900 border-asphalt-400",
    icon: <WaitingIcon />,
  },
};

/** Where the car stands against one limit: icon, word and colour together, never colour alone. */
export function EnvelopeStatus({ look }: { look: OutcomeLook }) {
  const { className, icon } = LOOK[look.state];
  return (
    <span
      className={`inline-flex items-center gap-1.5 rounded-full border-2 px-3 py-0.5 text-base font-semibold ${className}`}
      data-state={look.state}
    >
      {look.state === "unlimited" ? null : icon}
      {look.word}
    </span>
  );
}
