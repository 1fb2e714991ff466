import { combineLinear, type Measurand } from "../measurement/combine-linear";
import type { DimensionMap } from "../measurement/summarise-dimensions";
import type { LengthDimension } from "../records/record-schema";

/** A derived aero quantity, or the readings it still needs. */
export type Derived =
  | { ok: true; measurand: Measurand }
  | { ok: false; missing: LengthDimension[] };

/** Every aero quantity a class rule can limit, all in millimetres. */
export type AeroGeometry = {
  wingTopFromGroundMm: Derived;
  /** Wing top from the ground − roof peak from the ground. */
  heightAboveRoofMm: Derived;
  /** Signed: + = the wing's rearmost point is behind the rearmost bodywork. */
  overhangMm: Derived;
  /** Span between the end plates' outer faces − body width. */
  spanOverBodyMm: Derived;
  /** As above with both end plates taken off (for rules that do not count them). */
  spanOverBodyWithoutEndPlatesMm: Derived;
  chordMm: Derived;
  /** Forward of the bumper's foremost point. */
  splitterProtrusionMm: Derived;
  /** Splitter width − body width. */
  splitterOverBodyMm: Derived;
};

/**
 * Turns what the scrutineer reads into the quantities the rules limit, with uncertainties
 * propagated (GUM §5.1.2, inputs uncorrelated): height above roof = wing top − roof peak (both
 * from the ground); overhang is read directly between the two plumb marks; span and body width
 * between outer faces; splitter protrusion from the bumper's foremost point.
 */
export function deriveAeroGeometry(dimensions: DimensionMap): AeroGeometry {
  const linear = (terms: ReadonlyArray<[number, LengthDimension]>): Derived => {
    const missing = terms.filter(([, d]) => !dimensions.has(d)).map(([, d]) => d);
    if (missing.length > 0) return { ok: false, missing };
    return {
      ok: true,
      measurand: combineLinear(
        terms.map(([coefficient, d]) => {
          const summary = dimensions.get(d);
          if (summary === undefined) throw new Error(`unreachable: ${d} checked above`);
          return { coefficient, summary };
        }),
      ),
    };
  };
  return {
    wingTopFromGroundMm: linear([[1, "wingTopFromGroundMm"]]),
    heightAboveRoofMm: linear([
      [1, "wingTopFromGroundMm"],
      [-1, "roofPeakFromGroundMm"],
    ]),
    overhangMm: linear([[1, "wingOverhangMm"]]),
    spanOverBodyMm: linear([
      [1, "wingSpanMm"],
      [-1, "bodyWidthMm"],
    ]),
    spanOverBodyWithoutEndPlatesMm: linear([
      [1, "wingSpanMm"],
      [-2, "endPlateThicknessMm"],
      [-1, "bodyWidthMm"],
    ]),
    chordMm: linear([[1, "wingChordMm"]]),
    splitterProtrusionMm: linear([[1, "splitterProtrusionMm"]]),
    splitterOverBodyMm: linear([
      [1, "splitterWidthMm"],
      [-1, "bodyWidthMm"],
    ]),
  };
}
