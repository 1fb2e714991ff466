import { CORNER_LABELS } from "@/lib/scrutineer/measurement/dimension-labels";
import type { Corner } from "@/lib/scrutineer/records/record-schema";
import { DiagramLabel } from "../parts/diagram-label";

/**
 * A scale pad's name in two short lines on the car's outer side ("left" / "front"): front pads
 * are named below themselves, rear pads above, so both stay inside the drawing.
 */
export function CornerPadLabel({
  corner,
  pad,
}: {
  corner: Corner;
  pad: { y: number; height: number };
}) {
  const left = corner === "lf" || corner === "lr";
  const front = corner === "lf" || corner === "rf";
  const [side, end] = CORNER_LABELS[corner].split(" ");
  const x = left ? 2 : 238;
  const anchor = left ? "start" : "end";
  const y = front ? pad.y + pad.height + 24 : pad.y - 30;
  return (
    <g>
      <DiagramLabel x={x} y={y} anchor={anchor} tone="accent">
        {side}
      </DiagramLabel>
      <DiagramLabel x={x} y={y + 20} anchor={anchor} tone="accent">
        {end}
      </DiagramLabel>
    </g>
  );
}
