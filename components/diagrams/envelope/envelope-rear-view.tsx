import { formatLength } from "@/lib/scrutineer/units/format-length";
import { CarRear } from "../car/car-rear";
import { END } from "../car/end-geometry";
import { WingRear } from "../car/wing-rear";
import { TONE_SOFT_FILL } from "../parts/diagram-tones";
import type { DiagramView } from "../parts/diagram-view";
import { GroundLine } from "../parts/ground-line";
import { MeasureLine } from "../parts/measure-line";
import { projectPoint } from "../parts/project-point";
import { envelopeMarginText } from "./envelope-margin-text";
import type { ClassEnvelopeProps } from "./envelope-types";
import { GapBracket } from "./gap-bracket";
import { LimitLine } from "./limit-line";
import { MarginLabel } from "./margin-label";
import { outcomeLook } from "./outcome-look";
import { rearEnvelopeLayout } from "./rear-envelope-layout";
import { wrapWords } from "./wrap-words";

const W = 360;
const SCALE = 1.25;
const SLOT_CHARS = 34;

/**
 * The class envelope from behind: the allowed width as two upright dashed lines, the wing at
 * its measured span between or beyond them, the room or excess on each side in the state's
 * colour, and the margin written at the top.
 */
export function EnvelopeRearView({
  span,
  unit,
  label,
}: Pick<ClassEnvelopeProps, "span" | "unit"> & { label: string }) {
  const layout = rearEnvelopeLayout(span);
  const look = outcomeLook(span);
  const f = (mm: number) => formatLength(mm, unit);
  const allowance =
    span.limitMm === null
      ? "no span limit"
      : span.limitMm === 0
        ? "limit: the body's width"
        : span.limitMm > 0
          ? `limit: body + ${f(span.limitMm)}`
          : `limit: body − ${f(-span.limitMm)}`;
  const spanWords =
    span.wingSpanMm === null
      ? "span not measured yet"
      : `span ${f(span.wingSpanMm)}${span.endPlatesCounted ? "" : ", end plates not counted"}`;
  const bodyWords =
    span.bodyWidthMm === null ? "body width not measured yet" : `body ${f(span.bodyWidthMm)}`;
  const margin = envelopeMarginText(span, unit);
  // Span and body on one line when it fits the drawing's width, else one line each.
  const together = `${spanWords} · ${bodyWords}`;
  // With no limit the margin line already says so; the allowance would say it again.
  const notes = [
    ...(together.length <= SLOT_CHARS ? [together] : [spanWords, bodyWords]),
    ...(span.limitMm === null ? [] : [allowance]),
  ];
  // The words take the top band; the wing's end plates start under it, whatever its length.
  const lines = (margin === look.word ? 0 : wrapWords(margin, SLOT_CHARS).length) + notes.length;
  const VIEW: DiagramView = {
    x: -24,
    y: END.wing.topY - (44 + lines * 21 + 26) / SCALE,
    scale: SCALE,
  };
  const H = Math.round((END.groundY - VIEW.y) * SCALE) + 44;
  const c = END.centreX;
  const w = END.wing;
  const p = (x: number, y: number) => projectPoint(VIEW, x, y);
  const [, plateTop] = p(0, w.topY);
  const [, plateBottom] = p(0, w.topY + w.plateHeight);
  const [, widestY] = p(0, END.body.widestY);
  const [, groundY] = p(0, END.groundY);
  const x = (half: number, side: -1 | 1) => p(c + side * half, 0)[0];
  const limit =
    layout.limitHalf === null
      ? null
      : { left: x(layout.limitHalf, -1), right: x(layout.limitHalf, 1) };
  const compared = { left: x(layout.comparedHalf, -1), right: x(layout.comparedHalf, 1) };
  const spanY = plateTop - 12;
  const bodyY = groundY + 20;
  const sides =
    limit === null
      ? []
      : ([
          [limit.left, compared.left],
          [limit.right, compared.right],
        ] as const);

  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-label={label}
      className="block h-auto w-full font-sans"
      data-testid="envelope-span"
      data-state={look.state}
      data-limit-right-x={limit?.right}
      data-wing-right-x={compared.right}
    >
      <title>{label}</title>
      <GroundLine x1={0} x2={W} y={groundY} />
      <CarRear view={VIEW} wing="none" />
      {layout.measured
        ? sides.map(([a, b]) => (
            <rect
              key={a}
              x={Math.min(a, b)}
              y={plateTop}
              width={Math.abs(a - b)}
              height={plateBottom - plateTop}
              className={TONE_SOFT_FILL[look.tone]}
            />
          ))
        : null}
      {sides.map(([a]) => (
        <LimitLine key={a} x1={a} y1={spanY - 4} x2={a} y2={widestY} />
      ))}
      <WingRear
        view={VIEW}
        halfSpan={layout.wingHalf}
        tone={span.wingSpanMm === null ? "dashed" : "solid"}
      />
      {layout.measured
        ? sides.map(([a, b]) => (
            <GapBracket
              key={a}
              x1={a}
              y1={plateBottom + 12}
              x2={b}
              y2={plateBottom + 12}
              tone={look.tone}
            />
          ))
        : null}
      <MeasureLine
        x1={x(layout.wingHalf, -1)}
        y1={spanY}
        x2={x(layout.wingHalf, 1)}
        y2={spanY}
        ends="ticks"
        tone="neutral"
        dashed={span.wingSpanMm === null}
      />
      {[x(layout.bodyHalf, -1), x(layout.bodyHalf, 1)].map((bx) => (
        <line
          key={bx}
          x1={bx}
          y1={widestY}
          x2={bx}
          y2={bodyY + 8}
          strokeWidth={3}
          strokeDasharray="3 5"
          className="stroke-asphalt-600"
        />
      ))}
      <MeasureLine
        x1={x(layout.bodyHalf, -1)}
        y1={bodyY}
        x2={x(layout.bodyHalf, 1)}
        y2={bodyY}
        tone="neutral"
        dashed={span.bodyWidthMm === null}
      />
      <MarginLabel
        x={6}
        y={4}
        title="Span"
        look={look}
        text={margin}
        maxChars={SLOT_CHARS}
        notes={notes}
      />
    </svg>
  );
}
