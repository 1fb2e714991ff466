import type { ReactNode } from "react";
import type { Corner, Dimension } from "@/lib/scrutineer/records/record-schema";
import { DiagramFigure } from "./parts/diagram-figure";
import { readingDiagramText } from "./reading-diagram-text";
import { BODY_WIDTH_DRAWING_HEIGHT, BodyWidthDrawing } from "./readings/body-width-drawing";
import {
  CORNER_WEIGHT_DRAWING_HEIGHT,
  CornerWeightDrawing,
} from "./readings/corner-weight-drawing";
import { END_PLATE_DRAWING_HEIGHT, EndPlateDrawing } from "./readings/end-plate-drawing";
import { NOISE_DRAWING_HEIGHT, NoiseDrawing } from "./readings/noise-drawing";
import { ROOF_PEAK_DRAWING_HEIGHT, RoofPeakDrawing } from "./readings/roof-peak-drawing";
import {
  SPLITTER_PROTRUSION_DRAWING_HEIGHT,
  SplitterProtrusionDrawing,
} from "./readings/splitter-protrusion-drawing";
import {
  SPLITTER_WIDTH_DRAWING_HEIGHT,
  SplitterWidthDrawing,
} from "./readings/splitter-width-drawing";
import { WING_CHORD_DRAWING_HEIGHT, WingChordDrawing } from "./readings/wing-chord-drawing";
import {
  WING_OVERHANG_DRAWING_HEIGHT,
  WingOverhangDrawing,
} from "./readings/wing-overhang-drawing";
import { WING_SPAN_DRAWING_HEIGHT, WingSpanDrawing } from "./readings/wing-span-drawing";
import { WING_TOP_DRAWING_HEIGHT, WingTopDrawing } from "./readings/wing-top-drawing";

/** Props of {@link ReadingDiagram}. */
export type ReadingDiagramProps = {
  /** The reading the field takes. */
  dimension: Dimension;
  /** For corner weights: the pad to highlight; without it all four are. Ignored otherwise. */
  corner?: Corner | null;
  /** Sizing of the figure; the drawing is fluid and reads from 160 to 320 px wide. */
  className?: string;
  /** Leave the caption off when the field shows the same words itself. */
  hideCaption?: boolean;
};

/**
 * A small line drawing beside a reading field showing where that reading is taken, the
 * measured segment in the accent colour, with a one-line caption. Presentational only.
 */
export function ReadingDiagram({
  dimension,
  corner = null,
  className,
  hideCaption = false,
}: ReadingDiagramProps) {
  const text = readingDiagramText(dimension, corner);
  const { height, drawing } = drawingFor(dimension, corner);
  return (
    <DiagramFigure
      label={text.label}
      caption={text.caption}
      height={height}
      hideCaption={hideCaption}
      testId="reading-diagram"
      className={className}
    >
      <g data-dimension={dimension}>{drawing}</g>
    </DiagramFigure>
  );
}

function drawingFor(
  dimension: Dimension,
  corner: Corner | null,
): { height: number; drawing: ReactNode } {
  switch (dimension) {
    case "wingTopFromGroundMm":
      return { height: WING_TOP_DRAWING_HEIGHT, drawing: <WingTopDrawing /> };
    case "roofPeakFromGroundMm":
      return { height: ROOF_PEAK_DRAWING_HEIGHT, drawing: <RoofPeakDrawing /> };
    case "wingOverhangMm":
      return { height: WING_OVERHANG_DRAWING_HEIGHT, drawing: <WingOverhangDrawing /> };
    case "wingSpanMm":
      return { height: WING_SPAN_DRAWING_HEIGHT, drawing: <WingSpanDrawing /> };
    case "endPlateThicknessMm":
      return { height: END_PLATE_DRAWING_HEIGHT, drawing: <EndPlateDrawing /> };
    case "bodyWidthMm":
      return { height: BODY_WIDTH_DRAWING_HEIGHT, drawing: <BodyWidthDrawing /> };
    case "splitterProtrusionMm":
      return { height: SPLITTER_PROTRUSION_DRAWING_HEIGHT, drawing: <SplitterProtrusionDrawing /> };
    case "splitterWidthMm":
      return { height: SPLITTER_WIDTH_DRAWING_HEIGHT, drawing: <SplitterWidthDrawing /> };
    case "wingChordMm":
      return { height: WING_CHORD_DRAWING_HEIGHT, drawing: <WingChordDrawing /> };
    case "cornerWeightKg":
      return {
        height: CORNER_WEIGHT_DRAWING_HEIGHT,
        drawing: <CornerWeightDrawing corner={corner} />,
      };
    case "noiseDbA":
      return { height: NOISE_DRAWING_HEIGHT, drawing: <NoiseDrawing /> };
  }
}
