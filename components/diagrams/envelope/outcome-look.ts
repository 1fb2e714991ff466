import type { DiagramTone } from "../parts/diagram-tones";
import type { EnvelopeCheck } from "./envelope-types";

/** The word and tone a limit is shown with; the tone never appears without the word. */
export type OutcomeLook = {
  word: "inside" | "over" | "too close to call" | "not measured yet" | "no limit";
  tone: DiagramTone;
  state: "inside" | "over" | "unsure" | "waiting" | "unlimited";
};

/** How a limit is shown: unlimited and not-measured first, then the verdict's outcome. */
export function outcomeLook(check: EnvelopeCheck): OutcomeLook {
  if (check.limitMm === null) return { word: "no limit", tone: "neutral", state: "unlimited" };
  if (check.measuredMm === null || check.outcome === "waiting") {
    return { word: "not measured yet", tone: "neutral", state: "waiting" };
  }
  switch (check.outcome) {
    case "pass":
      return { word: "inside", tone: "cleared", state: "inside" };
    case "fail":
      return { word: "over", tone: "stopped", state: "over" };
    case "inconclusive":
      return { word: "too close to call", tone: "attention", state: "unsure" };
  }
}
