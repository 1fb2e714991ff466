/**
 * Where a drawing's own coordinates (the car's space) land in the SVG: shift by (x, y), then
 * scale. Parts are projected point by point instead of wrapped in a scaled <g>, so every stroke
 * width stays in the SVG's own units and stays thick enough on a small phone.
 */
export type DiagramView = { x: number; y: number; scale: number };

/** The car's space as it is: no shift, no zoom. */
export const WHOLE_CAR: DiagramView = { x: 0, y: 0, scale: 1 };

/** Every reading drawing is this many units wide, so line widths and type match across them. */
export const DIAGRAM_WIDTH = 240;
