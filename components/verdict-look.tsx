import type { ReactNode } from "react";
import type { VerdictWord } from "@/lib/verdict-word";
import {
  AttentionIcon,
  ClearedIcon,
  MovedUpIcon,
  StoppedIcon,
  WaitingIcon,
} from "./icons/state-icons";

/** How each verdict state looks: its state colours (classes) and icon. Always shown with the
 *  state's word (DESIGN.md: never colour alone). */
export const verdictLook: Record<VerdictWord, { className: string; icon: ReactNode }> = {
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
