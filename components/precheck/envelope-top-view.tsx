import { envelopeMarginText } from "@/components/diagrams/envelope/envelope-margin-text";
import type { ClassEnvelopeProps } from "@/components/diagrams/envelope/envelope-types";
import { GapBracket } from "@/components/diagrams/envelope/gap-bracket";
import { LimitLine } from "@/components/diagrams/envelope/limit-line";
import { MarginLabel } from "@/components/diagrams/envelope/margin-label";
import { type OutcomeLook, outcomeLook } from "@/components/diagrams/envelope/outcome-look";
import { type AxisScale, placeOnAxis } from "@/components/diagrams/envelope/place-on-axis";
import { rearEnvelopeLayout } from "@/components/diagrams/envelope/rear-envelope-layout";
import { DiagramLabel } from "@/components/diagrams/parts/diagram-label";
import { TONE_SOFT_FILL } from "@/components/diagrams/parts/diagram-tones";

const W = 360;
const CX = W / 2;
/** The rear view's half-widths (car units) are drawn this much larger from above. */
const SCALE = 1.4;
/** Not to scale along the car: steps kept between 14 and 34 units. */
const BACK_AXIS: AxisScale = { unitsPerMm: 0.2, minGap: 14, maxGap: 34 };
const CHORD = 22;
const SLOT_CHARS = 34;

const rank: Record<OutcomeLook["state"], number> = {
  over: 4,
  unsure: 3,
  waiting: 2,
  inside: 1,
  unlimited: 0,
};

/**
 * The class envelope from above, front at the top: the allowed width as two dashed lines beside
 * the body, the overhang limit as a dashed line behind the rear bumper, and the wing (span ×
 * chord) where it is planned or read; any excess is filled in the state's colour, bracketed and
 * written out. Not to scale, but never out of order (the rear view's and side view's rules).
 */
export function EnvelopeTopView({
  span,
  overhang,
  unit,
  label,
}: Pick<ClassEnvelopeProps, "span" | "overhang" | "unit"> & { label: string }) {
  const layout = rearEnvelopeLayout(span);
  const spanLook = outcomeLook(span);
  const backLook = outcomeLook(overhang);
  const worst = rank[spanLook.state] >= rank[backLook.state] ? spanLook : backLook;
  const notes = [
    `Span: ${envelopeMarginText(span, unit)}`,
    `Behind the bodywork: ${envelopeMarginText(overhang, unit)}`,
  ];
  const top = 20 + 28 + notes.length * 21 + 20;
  const bodyFront = top + 10;
  const bumperY = bodyFront + 150;
  const values = [overhang.limitMm, overhang.measuredMm].filter((v): v is number => v !== null);
  const back = placeOnAxis(0, values, BACK_AXIS);
  const limitY = overhang.limitMm === null ? null : bumperY + back(overhang.limitMm);
  const trailingY =
    overhang.measuredMm !== null
      ? bumperY + back(overhang.measuredMm)
      : limitY !== null
        ? limitY - 12
        : bumperY;
  const leadingY = trailingY - CHORD;
  const H = Math.round(Math.max(bumperY, trailingY, limitY ?? 0) + 60);
  const half = (h: number) => h * SCALE;
  const bodyHalf = half(layout.bodyHalf);
  const wingHalf = half(layout.wingHalf);
  const comparedHalf = half(layout.comparedHalf);
  const limitHalf = layout.limitHalf === null ? null : half(layout.limitHalf);
  const spanOver = spanLook.state === "over" || spanLook.state === "unsure";
  const backOver = backLook.state === "over" || backLook.state === "unsure";

  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-label={label}
      className="block h-auto w-full font-sans"
      data-testid="envelope-top"
      data-state={worst.state}
    >
      <title>{label}</title>
      {/* The body from above, rear at the bottom. */}
      <path
        d={`M ${CX - bodyHalf + 14} ${bodyFront} L ${CX + bodyHalf - 14} ${bodyFront} Q ${CX + bodyHalf} ${bodyFront} ${CX + bodyHalf} ${bodyFront + 14} L ${CX + bodyHalf} ${bumperY - 12} Q ${CX + bodyHalf} ${bumperY} ${CX + bodyHalf - 12} ${bumperY} L ${CX - bodyHalf + 12} ${bumperY} Q ${CX - bodyHalf} ${bumperY} ${CX - bodyHalf} ${bumperY - 12} L ${CX - bodyHalf} ${bodyFront + 14} Q ${CX - bodyHalf} ${bodyFront} ${CX - bodyHalf + 14} ${bodyFront} Z`}
        strokeWidth={3}
        className="fill-white stroke-asphalt-900"
        data-part="body"
      />
      <path
        d={`M ${CX - bodyHalf * 0.7} ${bodyFront + 50} L ${CX + bodyHalf * 0.7} ${bodyFront + 50} L ${CX + bodyHalf * 0.66} ${bodyFront + 110} L ${CX - bodyHalf * 0.66} ${bodyFront + 110} Z`}
        strokeWidth={3}
        className="fill-asphalt-200 stroke-asphalt-900"
      />
      <DiagramLabel x={CX - 40} y={bumperY + 22} size={15}>
        rear bumper
      </DiagramLabel>
      {/* Excess beyond the span limit, each side. */}
      {limitHalf !== null && layout.measured && spanOver
        ? [-1, 1].map((side) => (
            <rect
              key={`span-${side}`}
              x={side < 0 ? CX - comparedHalf : CX + limitHalf}
              y={leadingY}
              width={Math.max(0, comparedHalf - limitHalf)}
              height={CHORD}
              className={TONE_SOFT_FILL[spanLook.tone]}
              data-part="violation"
              data-limit="span"
            />
          ))
        : null}
      {/* Excess beyond the overhang limit. */}
      {limitY !== null && overhang.measuredMm !== null && backOver ? (
        <rect
          x={CX - wingHalf}
          y={limitY}
          width={wingHalf * 2}
          height={Math.max(0, trailingY - limitY)}
          className={TONE_SOFT_FILL[backLook.tone]}
          data-part="violation"
          data-limit="overhang"
        />
      ) : null}
      {/* The wing: span across, chord along the car. */}
      <rect
        x={CX - wingHalf}
        y={leadingY}
        width={wingHalf * 2}
        height={CHORD}
        strokeWidth={3}
        fillOpacity={0.35}
        className="fill-asphalt-700 stroke-asphalt-950"
        data-part="wing"
      />
      {limitHalf !== null
        ? [-1, 1].map((side) => (
            <LimitLine
              key={`limit-${side}`}
              x1={CX + side * limitHalf}
              y1={bodyFront}
              x2={CX + side * limitHalf}
              y2={H - 20}
            />
          ))
        : null}
      {limitY !== null ? <LimitLine x1={12} y1={limitY} x2={W - 12} y2={limitY} /> : null}
      {limitHalf !== null && layout.measured && spanOver
        ? [-1, 1].map((side) => (
            <GapBracket
              key={`gap-${side}`}
              x1={CX + side * limitHalf}
              y1={trailingY + 12}
              x2={CX + side * comparedHalf}
              y2={trailingY + 12}
              tone={spanLook.tone}
            />
          ))
        : null}
      {limitY !== null && overhang.measuredMm !== null && backOver ? (
        <GapBracket
          x1={CX + wingHalf + 14}
          y1={limitY}
          x2={CX + wingHalf + 14}
          y2={trailingY}
          tone={backLook.tone}
        />
      ) : null}
      <MarginLabel
        x={6}
        y={4}
        title="From above"
        look={worst}
        text={worst.word}
        maxChars={SLOT_CHARS}
        notes={notes}
      />
    </svg>
  );
}
