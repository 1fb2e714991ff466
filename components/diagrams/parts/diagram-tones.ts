/**
 * Colours a drawing may use, as Tailwind classes from our palette. `accent` marks the reading
 * being taken; the state tones only ever appear beside their word ("inside", "over", "unsure").
 */
export type DiagramTone = "accent" | "cleared" | "attention" | "stopped" | "neutral";

export const TONE_STROKE: Record<DiagramTone, string> = {
  accent: "stroke-accent",
  cleared: "stroke-cleared",
  attention: "stroke-attention",
  stopped: "stroke-stopped",
  neutral: "stroke-asphalt-600",
};

export const TONE_FILL: Record<DiagramTone, string> = {
  accent: "fill-accent",
  cleared: "fill-cleared",
  attention: "fill-attention",
  stopped: "fill-stopped",
  neutral: "fill-asphalt-600",
};

/** Label text: darker than the line colour where the palette has a darker step. */
export const TONE_TEXT: Record<DiagramTone, string> = {
  accent: "fill-accent-strong",
  cleared: "fill-cleared",
  attention: "fill-attention",
  stopped: "fill-stopped",
  neutral: "fill-asphalt-800",
};

export const TONE_SOFT_FILL: Record<DiagramTone, string> = {
  accent: "fill-accent-soft",
  cleared: "fill-cleared-soft",
  attention: "fill-attention-soft",
  stopped: "fill-stopped-soft",
  neutral: "fill-asphalt-100",
};
