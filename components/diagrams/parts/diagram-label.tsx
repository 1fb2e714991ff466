import type { ReactNode } from "react";
import { type DiagramTone, TONE_TEXT } from "./diagram-tones";

/**
 * A word or number on a drawing, semibold with a white halo so it stays legible where it
 * crosses a line. Sizes are in SVG units; 19 reads at about 13 px on a 160 px wide drawing.
 */
export function DiagramLabel({
  x,
  y,
  anchor = "start",
  tone,
  size = 19,
  bold = false,
  children,
}: {
  x: number;
  y: number;
  anchor?: "start" | "middle" | "end";
  tone?: DiagramTone;
  size?: number;
  bold?: boolean;
  children: ReactNode;
}) {
  return (
    <text
      x={x}
      y={y}
      textAnchor={anchor}
      fontSize={size}
      fontWeight={bold ? 700 : 600}
      className={`tabular ${tone === undefined ? "fill-asphalt-950" : TONE_TEXT[tone]} stroke-white`}
      strokeWidth={5}
      strokeLinejoin="round"
      paintOrder="stroke"
    >
      {children}
    </text>
  );
}
