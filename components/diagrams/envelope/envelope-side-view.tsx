import { formatLength } from "@/lib/scrutineer/units/format-length";
import { CarSide } from "../car/car-side";
import { SIDE, WING_SIDE } from "../car/side-geometry";
import { WingSide } from "../car/wing-side";
import { DiagramLabel } from "../parts/diagram-label";
import { TONE_SOFT_FILL } from "../parts/diagram-tones";
import type { DiagramView } from "../parts/diagram-view";
import { projectPoint } from "../parts/project-point";
import { envelopeMarginText } from "./envelope-margin-text";
import type { ClassEnvelopeProps } from "./envelope-types";
import { GapBracket } from "./gap-bracket";
import { LimitLine } from "./limit-line";
import { MarginLabel } from "./margin-label";
import { outcomeLook } from "./outcome-look";
import { sideEnvelopeLayout } from "./side-envelope-layout";
import { wrapWords } from "./wrap-words";

const W = 360;
const SCALE = 2;
/** The height's words sit in a band at the top, the overhang's below the line where the car is
 * cut off (CROP_CAR_Y in the car's units): nothing written crosses the drawing. */
const CROP_CAR_Y = 110;
const HEIGHT_CHARS = 36;
const OVERHANG_CHARS = 32;
/** Room under the cut for the name of the rearmost-bodywork line. */
const LINE_LABEL_BAND = 24;

/**
 * The class envelope from the side: the height limit as a level dashed line, the overhang limit
 * as an upright one, the wing where its readings put it, the room or excess in the state's
 * colour, and each margin written out (height top left, overhang along the bottom).
 * Not to scale; the order of things is always true.
 */
export function EnvelopeSideView({
  height,
  overhang,
  unit,
  label,
}: Pick<ClassEnvelopeProps, "height" | "overhang" | "unit"> & { label: string }) {
  const layout = sideEnvelopeLayout(height, overhang);
  const hLook = outcomeLook(height);
  const oLook = outcomeLook(overhang);
  const fromRoof = height.reference === "roof-peak";
  const heightText = envelopeMarginText(height, unit);
  const heightNotes =
    height.limitMm === null
      ? []
      : [
          `limit ${formatLength(height.limitMm, unit)} ${fromRoof ? "above the roof's peak" : "from the ground"}`,
        ];
  const heightLines =
    (heightText === hLook.word ? 0 : wrapWords(heightText, HEIGHT_CHARS).length) +
    heightNotes.length;
  const BAND_Y = 44 + heightLines * 21;
  const overhangText = envelopeMarginText(overhang, unit);
  const overhangNotes =
    overhang.limitMm === null
      ? []
      : [`limit ${formatLength(overhang.limitMm, unit)} behind the rearmost bodywork`];
  const overhangLines =
    (overhangText === oLook.word ? 0 : wrapWords(overhangText, OVERHANG_CHARS).length) +
    overhangNotes.length;
  // The view follows the wing: its highest point (or the height line) sits just under the band.
  const highest = Math.min(layout.wingTopY, layout.heightLimitY ?? Infinity, SIDE.roofPeak.y);
  const VIEW: DiagramView = { x: 110, y: highest - (BAND_Y + 14) / SCALE, scale: SCALE };
  const CROP_Y = Math.round((CROP_CAR_Y - VIEW.y) * SCALE);
  const H = CROP_Y + LINE_LABEL_BAND + 52 + overhangLines * 21;
  const p = (x: number, y: number) => projectPoint(VIEW, x, y);
  const [roofX, roofY] = p(SIDE.roofPeak.x, SIDE.roofPeak.y);
  const [bumperX, bumperTop] = p(SIDE.bumperRear.x, SIDE.hatch.to.y);
  const [wingRear, wingTop] = p(layout.wingRearX, layout.wingTopY);
  const [wingFront, wingBottom] = p(
    layout.wingRearX - WING_SIDE.plateLength,
    layout.wingTopY + WING_SIDE.plateHeight,
  );
  const lineY = layout.heightLimitY === null ? null : p(0, layout.heightLimitY)[1];
  const lineX = layout.overhangLimitX === null ? null : p(layout.overhangLimitX, 0)[0];
  const ghost = !layout.heightMeasured && !layout.overhangMeasured;
  const limitRight = lineX ?? W;

  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-label={label}
      className="block h-auto w-full font-sans"
      data-testid="envelope-side"
    >
      <title>{label}</title>
      {/* Where the class lets the wing be: under the height line, ahead of the overhang line. */}
      <rect
        x={0}
        y={lineY ?? BAND_Y}
        width={limitRight}
        height={CROP_Y - (lineY ?? BAND_Y)}
        className="fill-asphalt-100"
      />
      <CarSide view={VIEW} wing={false} />
      <rect x={0} y={CROP_Y} width={W} height={H - CROP_Y} className="fill-white" />
      <rect x={0} y={0} width={W} height={BAND_Y} className="fill-white" />
      <line x1={0} y1={CROP_Y} x2={W} y2={CROP_Y} strokeWidth={3} className="stroke-asphalt-300" />

      {fromRoof ? (
        <g>
          <line
            x1={roofX}
            y1={roofY}
            x2={W}
            y2={roofY}
            strokeWidth={3}
            strokeDasharray="3 5"
            className="stroke-asphalt-600"
          />
          <DiagramLabel x={W - 4} y={roofY + 20} anchor="end" size={16}>
            roof peak
          </DiagramLabel>
        </g>
      ) : null}
      <line
        x1={bumperX}
        y1={bumperTop}
        x2={bumperX}
        y2={CROP_Y}
        strokeWidth={3}
        strokeDasharray="3 5"
        className="stroke-asphalt-600"
      />
      {/* Named under the cut, clear of the car, where its dashed line ends. */}
      <DiagramLabel x={bumperX} y={CROP_Y + LINE_LABEL_BAND - 6} anchor="middle" size={16}>
        rearmost bodywork
      </DiagramLabel>

      {lineY !== null && layout.heightMeasured ? (
        <rect
          x={wingFront}
          y={Math.min(lineY, wingTop)}
          width={wingRear - wingFront}
          height={Math.abs(lineY - wingTop)}
          className={TONE_SOFT_FILL[hLook.tone]}
        />
      ) : null}
      {lineX !== null && layout.overhangMeasured ? (
        <rect
          x={Math.min(lineX, wingRear)}
          y={wingTop}
          width={Math.abs(lineX - wingRear)}
          height={wingBottom - wingTop}
          className={TONE_SOFT_FILL[oLook.tone]}
        />
      ) : null}
      {lineY !== null ? <LimitLine x1={0} y1={lineY} x2={limitRight} y2={lineY} /> : null}
      {lineX !== null ? <LimitLine x1={lineX} y1={lineY ?? BAND_Y} x2={lineX} y2={CROP_Y} /> : null}

      <WingSide view={VIEW} rearX={layout.wingRearX} topY={layout.wingTopY} ghost={ghost} />

      <g
        data-testid="envelope-height"
        data-state={hLook.state}
        data-limit-y={lineY ?? undefined}
        data-wing-top-y={wingTop}
      >
        {lineY !== null && layout.heightMeasured ? (
          <GapBracket
            x1={wingFront - 10}
            y1={lineY}
            x2={wingFront - 10}
            y2={wingTop}
            tone={hLook.tone}
          />
        ) : null}
        <MarginLabel
          x={6}
          y={4}
          title="Height"
          look={hLook}
          text={heightText}
          maxChars={HEIGHT_CHARS}
          notes={heightNotes}
        />
      </g>

      <g
        data-testid="envelope-overhang"
        data-state={oLook.state}
        data-limit-x={lineX ?? undefined}
        data-wing-rear-x={wingRear}
      >
        {lineX !== null && layout.overhangMeasured ? (
          <GapBracket
            x1={lineX}
            y1={wingBottom + 12}
            x2={wingRear}
            y2={wingBottom + 12}
            tone={oLook.tone}
          />
        ) : null}
        <MarginLabel
          x={6}
          y={CROP_Y + LINE_LABEL_BAND + 8}
          title="Overhang"
          look={oLook}
          text={overhangText}
          maxChars={OVERHANG_CHARS}
          notes={overhangNotes}
        />
      </g>
    </svg>
  );
}
