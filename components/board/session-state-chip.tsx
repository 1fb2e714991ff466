import {
  AttentionIcon,
  ClearedIcon,
  StoppedIcon,
  WaitingIcon,
} from "@/components/icons/state-icons";
import type { LiveSession } from "@/lib/paddock/live-session";

const chips: Record<
  LiveSession["state"],
  { word: string; className: string; icon: React.ReactNode }
> = {
  planned: {
    word: "Not called yet",
    className: "bg-asphalt-100 text-asphalt-900 border-asphalt-400",
    icon: <WaitingIcon />,
  },
  called: {
    word: "Called",
    className: "bg-accent-soft text-accent-strong border-accent",
    icon: <WaitingIcon />,
  },
  "on-track": {
    word: "On track",
    className: "bg-cleared-soft text-cleared border-cleared-line",
    icon: <ClearedIcon />,
  },
  "red-flag": {
    word: "Stopped: red flag",
    className: "bg-stopped-soft text-stopped border-stopped-line",
    icon: <StoppedIcon />,
  },
  finished: {
    word: "Finished",
    className: "bg-asphalt-100 text-asphalt-900 border-asphalt-400",
    icon: <ClearedIcon />,
  },
  "cut-short": {
    word: "Cut short",
    className: "bg-attention-soft text-attention border-attention-line",
    icon: <AttentionIcon />,
  },
};

/** Where a session stands by the clerk of course's latest mark, as word + icon + colour. */
export function SessionStateChip({ state }: { state: LiveSession["state"] }) {
  const chip = chips[state];
  return (
    <span
      className={`inline-flex items-center gap-1.5 rounded-full border-2 px-3 py-0.5 text-base font-semibold 2xl:text-xl ${chip.className}`}
      data-testid="session-state"
      data-state={state}
    >
      {chip.icon}
      <span className="whitespace-nowrap">{chip.word}</span>
    </span>
  );
}
