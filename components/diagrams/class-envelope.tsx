import { EnvelopeReadout } from "./envelope/envelope-readout";
import { EnvelopeRearView } from "./envelope/envelope-rear-view";
import { envelopeRowSentence, envelopeRows } from "./envelope/envelope-rows";
import { EnvelopeSideView } from "./envelope/envelope-side-view";
import type { ClassEnvelopeProps } from "./envelope/envelope-types";

/**
 * The class envelope for the pre-check and the car card: side view (height above the roof,
 * overhang) and rear view (span against the body), the wing placed inside or beyond each
 * dashed limit as measured, the margin written on the drawing, and the numbers listed under it.
 * Not to scale, but never out of order: an over wing is always drawn beyond its line.
 */
export function ClassEnvelope(props: ClassEnvelopeProps) {
  const rows = envelopeRows(props);
  const sentence = (key: string) => {
    const row = rows.find((r) => r.key === key);
    return row ? envelopeRowSentence(row) : "";
  };
  return (
    <figure
      className={`card space-y-3 ${props.className ?? ""}`}
      data-testid="class-envelope"
      data-unit={props.unit}
    >
      <figcaption>
        <span className="block text-xl font-bold">Class envelope: {props.classLabel}</span>
        <span className="block text-base text-asphalt-800">
          Not to scale. Each heavy dashed line is a class limit; the wing is drawn inside or beyond
          it as measured, with the margin written out.
        </span>
      </figcaption>
      <div className="grid gap-3 md:grid-cols-2">
        <EnvelopeSideView
          height={props.height}
          overhang={props.overhang}
          unit={props.unit}
          label={`Side view of the ${props.classLabel} class envelope. ${sentence("height")} ${sentence("overhang")}`}
        />
        <EnvelopeRearView
          span={props.span}
          unit={props.unit}
          label={`Rear view of the ${props.classLabel} class envelope. ${sentence("span")}`}
        />
      </div>
      <EnvelopeReadout rows={rows} />
    </figure>
  );
}
