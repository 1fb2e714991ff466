import { formatLength } from "@/lib/scrutineer/units/format-length";
import { envelopeMarginText } from "./envelope-margin-text";
import type { ClassEnvelopeProps, EnvelopeCheck } from "./envelope-types";
import { type OutcomeLook, outcomeLook } from "./outcome-look";

/** One limit in words, for the read-out under the drawing and the drawings' labels. */
export type EnvelopeRow = {
  key: "height" | "overhang" | "span" | "chord";
  title: string;
  /** The measured quantity in the event's unit, or "not measured yet". */
  reading: string;
  limit: string;
  look: OutcomeLook;
  margin: string;
};

/** The envelope's limits as rows of words, in the order the drawings show them. */
export function envelopeRows(props: ClassEnvelopeProps): EnvelopeRow[] {
  const { height, overhang, span, chord, unit } = props;
  const f = (mm: number) => formatLength(mm, unit);
  const row = (
    key: EnvelopeRow["key"],
    title: string,
    check: EnvelopeCheck,
    reading: string | null,
    limit: string,
  ): EnvelopeRow => ({
    key,
    title,
    reading: reading ?? "not measured yet",
    limit: check.limitMm === null ? "no limit in this class" : limit,
    look: outcomeLook(check),
    margin: envelopeMarginText(check, unit),
  });
  const fromRoof = height.reference === "roof-peak";
  const h = height.measuredMm;
  const o = overhang.measuredMm;
  const allowance = span.limitMm ?? 0;
  const rows: EnvelopeRow[] = [
    row(
      "height",
      fromRoof ? "Wing top above the roof" : "Wing top from the ground",
      height,
      h === null ? null : fromRoof && h < 0 ? `${f(-h)} below the roof` : f(h),
      `limit ${f(height.limitMm ?? 0)}`,
    ),
    row(
      "overhang",
      "Wing behind the bodywork",
      overhang,
      o === null ? null : o < 0 ? `${f(-o)} inside the bodywork` : f(o),
      `limit ${f(overhang.limitMm ?? 0)}`,
    ),
    row(
      "span",
      span.endPlatesCounted ? "Span, end plates counted" : "Span without end plates",
      span,
      span.wingSpanMm === null
        ? null
        : span.bodyWidthMm === null
          ? `${f(span.wingSpanMm)}; body width not measured yet`
          : `${f(span.wingSpanMm)} on a ${f(span.bodyWidthMm)} body`,
      allowance === 0
        ? "limit: the body's width"
        : allowance > 0
          ? `limit: body + ${f(allowance)}`
          : `limit: body − ${f(-allowance)}`,
    ),
  ];
  if (chord) {
    rows.push(
      row(
        "chord",
        "Wing chord",
        chord,
        chord.measuredMm === null ? null : f(chord.measuredMm),
        `limit ${f(chord.limitMm ?? 0)}`,
      ),
    );
  }
  return rows;
}

/** A row read aloud in one sentence, for a drawing's accessible label. */
export function envelopeRowSentence(row: EnvelopeRow): string {
  return `${row.title}: ${row.reading}; ${row.limit}; ${row.look.word}${
    row.margin === row.look.word || row.margin === row.limit ? "" : `, ${row.margin}`
  }.`;
}
