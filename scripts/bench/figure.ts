// One benchmark figure as the bench reports it: a ratio (or a time) per repetition, measured
// beside its floor in the same run, and min / median / max over the repetitions.
import { type Spread, spread } from "./summarize";

export type Target = { op: "≥" | "≤" | "≈"; value: number };

export type FigureRun = {
  /** The reported number: figure ÷ floor for a ratio, seconds for a time. */
  value: number;
  /** The measurements it came from (names carry their units). */
  detail: Record<string, number | string>;
};

export type Figure = {
  id: string;
  label: string;
  unit: "ratio" | "s" | "count";
  target: Target | null;
  /** How it is computed, in one line (printed under the table and in results.md). */
  definition: string;
  runs: FigureRun[];
  spread: Spread | null;
  /** Whether the median meets the target (null without a target or a measurement). */
  meetsTarget: boolean | null;
  /** Why the figure was not measured in this run, when it was not. */
  notMeasured: string | null;
  /** The absolute figures behind the median run, in words (printed beside the table). */
  note?: string;
};

/** Build a figure from its runs; `notMeasured` when it could not be measured. */
export function makeFigure(
  base: Omit<Figure, "spread" | "meetsTarget" | "notMeasured" | "runs">,
  runs: FigureRun[],
  notMeasured: string | null = null,
): Figure {
  if (notMeasured !== null || runs.length === 0)
    return {
      ...base,
      runs,
      spread: null,
      meetsTarget: null,
      notMeasured: notMeasured ?? "no run",
    };
  const s = spread(runs.map((r) => r.value));
  const t = base.target;
  const meetsTarget =
    t === null || t.op === "≈" ? null : t.op === "≥" ? s.median >= t.value : s.median <= t.value;
  return { ...base, runs, spread: s, meetsTarget, notMeasured: null };
}
