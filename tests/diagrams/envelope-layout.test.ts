import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { placeOnAxis } from "@/components/diagrams/envelope/place-on-axis";
import { rearEnvelopeLayout } from "@/components/diagrams/envelope/rear-envelope-layout";
import { sideEnvelopeLayout } from "@/components/diagrams/envelope/side-envelope-layout";
import { projectPath } from "@/components/diagrams/parts/project-path";

const SCALE = { unitsPerMm: 0.15, minGap: 9, maxGap: 24 };
const mm = fc.integer({ min: -3000, max: 3000 }).map((n) => n / 10);

describe("placing values along a drawing axis (not to scale, order kept)", () => {
  it("puts the anchor at 0 and keeps every pair in order, never closer than the minimum", () => {
    fc.assert(
      fc.property(mm, mm, mm, (anchor, a, b) => {
        const at = placeOnAxis(anchor, [a, b], SCALE);
        expect(at(anchor)).toBe(0);
        for (const [x, y] of [
          [anchor, a],
          [anchor, b],
          [a, b],
        ] as const) {
          if (x === y) expect(at(x)).toBe(at(y));
          else {
            expect(Math.sign(at(y) - at(x))).toBe(Math.sign(y - x));
            expect(Math.abs(at(y) - at(x))).toBeGreaterThanOrEqual(SCALE.minGap - 1e-9);
          }
        }
      }),
    );
  });

  it("clamps each step: 2 mm is drawn at the minimum, 300 mm at the maximum", () => {
    const at = placeOnAxis(0, [2, 302], SCALE);
    expect(at(2)).toBe(9);
    expect(at(302)).toBe(9 + 24);
  });

  it("refuses a value it was not given", () => {
    expect(() => placeOnAxis(0, [1], SCALE)(2)).toThrow(/not placed/);
  });
});

describe("the envelope never draws a wing on the wrong side of its line", () => {
  const limitMm = fc.integer({ min: 0, max: 4000 }).map((n) => n / 10);

  it("side view: above the height line and beyond the overhang line exactly when over", () => {
    fc.assert(
      fc.property(limitMm, mm, limitMm, mm, (hLimit, hValue, oLimit, oValue) => {
        const layout = sideEnvelopeLayout(
          { reference: "roof-peak", limitMm: hLimit, measuredMm: hValue, outcome: "pass" },
          { limitMm: oLimit, measuredMm: oValue, outcome: "pass" },
        );
        const lineY = layout.heightLimitY ?? Number.NaN;
        const lineX = layout.overhangLimitX ?? Number.NaN;
        // y grows downward: over the height limit is a smaller y.
        expect(Math.sign(lineY - layout.wingTopY)).toBe(Math.sign(hValue - hLimit));
        expect(Math.sign(layout.wingRearX - lineX)).toBe(Math.sign(oValue - oLimit));
      }),
    );
  });

  it("side view, height from the ground: above the line exactly when over", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 8000, max: 20000 }),
        fc.integer({ min: 8000, max: 20000 }),
        (l, v) => {
          const layout = sideEnvelopeLayout(
            { reference: "ground", limitMm: l / 10, measuredMm: v / 10, outcome: "pass" },
            { limitMm: null, measuredMm: null, outcome: "waiting" },
          );
          expect(Math.sign((layout.heightLimitY ?? Number.NaN) - layout.wingTopY)).toBe(
            Math.sign(v - l),
          );
        },
      ),
    );
  });

  it("rear view: the compared edge is outside the span lines exactly when over", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -500, max: 1000 }).map((n) => n / 10),
        mm,
        fc.boolean(),
        (allowance, over, plates) => {
          const layout = rearEnvelopeLayout({
            limitMm: allowance,
            measuredMm: over,
            outcome: "pass",
            wingSpanMm: 1500 + over,
            bodyWidthMm: 1500,
            endPlatesCounted: plates,
          });
          expect(Math.sign(layout.comparedHalf - (layout.limitHalf ?? Number.NaN))).toBe(
            Math.sign(over - allowance),
          );
          // End plates not counted: they sit outside the compared edge.
          expect(layout.wingHalf).toBeGreaterThanOrEqual(layout.comparedHalf);
        },
      ),
    );
  });
});

describe("projecting a part into a drawing", () => {
  it("shifts then scales each (x, y) pair", () => {
    expect(projectPath("M 10 20 L 30 40 Q 0 0 5 5 Z", { x: 10, y: 20, scale: 2 })).toBe(
      "M 0 0 L 40 40 Q -20 -40 -10 -30 Z",
    );
  });

  it("refuses commands whose numbers are not (x, y) pairs", () => {
    expect(() => projectPath("M 0 0 H 10", { x: 0, y: 0, scale: 1 })).toThrow(/not H/);
    expect(() => projectPath("M 0 0 L 10", { x: 0, y: 0, scale: 1 })).toThrow(/pair/);
  });
});
