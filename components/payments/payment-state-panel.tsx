import type { ReactNode } from "react";
import {
  AttentionIcon,
  ClearedIcon,
  StoppedIcon,
  WaitingIcon,
} from "@/components/icons/state-icons";

type Tone = "cleared" | "attention" | "stopped" | "waiting";

const tones: Record<Tone, { box: string; icon: ReactNode }> = {
  cleared: {
    box: "border-cleared-line bg-cleared-soft text-cleared",
    icon: <ClearedIcon className="mt-1 size-7 shrink-0" />,
  },
  attention: {
    box: "border-attention-line bg-attention-soft text-attention",
    icon: <AttentionIcon className="mt-1 size-7 shrink-0" />,
  },
  stopped: {
    box: "border-stopped-line bg-stopped-soft text-stopped",
    icon: <StoppedIcon className="mt-1 size-7 shrink-0" />,
  },
  waiting: {
    box: "border-asphalt-400 bg-asphalt-100 text-asphalt-950",
    icon: <WaitingIcon className="mt-1 size-7 shrink-0" />,
  },
};

/** Where the entry fee stands: a word, an icon and a colour together, never colour alone. */
export function PaymentStatePanel({
  tone,
  title,
  children,
}: {
  tone: Tone;
  title: string;
  children?: ReactNode;
}) {
  const look = tones[tone];
  return (
    <section
      className={`flex gap-3 rounded-xl border-2 p-4 ${look.box}`}
      data-testid="payment-state"
      aria-live="polite"
    >
      {look.icon}
      <div className="space-y-1">
        <p className="text-xl font-bold">{title}</p>
        {children ? <div className="text-lg">{children}</div> : null}
      </div>
    </section>
  );
}
