import type { DiagramView } from "./diagram-view";

/** A point of the car's space in SVG units, rounded to 0.01 (enough for any screen). */
export function projectPoint(view: DiagramView, x: number, y: number): [number, number] {
  return [round((x - view.x) * view.scale), round((y - view.y) * view.scale)];
}

/** A length of the car's space in SVG units. */
export function projectLength(view: DiagramView, length: number): number {
  return round(length * view.scale);
}

function round(value: number): number {
  return Math.round(value * 100) / 100;
}
