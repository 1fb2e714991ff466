/** The five verdict states people see (DESIGN.md): Waiting · Cleared · Moved up · Re-measure · Held. */
export const verdictWords = ["waiting", "cleared", "moved-up", "re-measure", "held"] as const;

export type VerdictWord = (typeof verdictWords)[number];

export const verdictLabels: Record<VerdictWord, string> = {
  waiting: "Waiting",
  cleared: "Cleared",
  "moved-up": "Moved up",
  "re-measure": "Re-measure",
  held: "Held",
};
