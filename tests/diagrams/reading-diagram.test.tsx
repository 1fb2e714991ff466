import { describe, expect, it } from "vitest";
import { ReadingDiagram } from "@/components/diagrams/reading-diagram";
import { dimensionLabel } from "@/lib/scrutineer/measurement/dimension-labels";
import {
  CORNERS,
  type Corner,
  type Dimension,
  LENGTH_DIMENSIONS,
} from "@/lib/scrutineer/records/record-schema";
import { attributeValues, render } from "./render-markup";

const EVERY_DIMENSION: Dimension[] = [...LENGTH_DIMENSIONS, "cornerWeightKg", "noiseDbA"];

function diagram(dimension: Dimension, corner: Corner | null = null): string {
  return render(<ReadingDiagram dimension={dimension} corner={corner} />);
}

describe("reading diagrams", () => {
  it("covers every dimension a reading can carry", () => {
    // The list is the engine's, so a new dimension without a drawing fails here.
    expect(EVERY_DIMENSION).toHaveLength(11);
    for (const dimension of EVERY_DIMENSION) {
      const markup = diagram(dimension);
      expect(markup, dimension).toContain(`data-dimension="${dimension}"`);
    }
  });

  it.each(EVERY_DIMENSION)("%s is one labelled image naming what is measured", (dimension) => {
    const markup = diagram(dimension);
    expect(markup.match(/<svg/g)).toHaveLength(1);
    expect(attributeValues(markup, "role")).toEqual(["img"]);
    const [label = ""] = attributeValues(markup, "aria-label");
    expect(label).toContain(dimensionLabel(dimension));
    // The <title> says the same for screen readers that read titles rather than labels.
    expect(markup).toContain(`<title>${label}</title>`);
    expect(markup).toMatch(/<figcaption[^>]*>[^<]{10,}<\/figcaption>/);
  });

  it.each(EVERY_DIMENSION)(
    "%s highlights the measured segment in the accent colour",
    (dimension) => {
      const markup = diagram(dimension);
      expect(markup).toMatch(/class="[^"]*\bstroke-accent\b/);
    },
  );

  it("draws a different picture for every dimension", () => {
    const drawings = new Set(
      EVERY_DIMENSION.map((d) =>
        diagram(d).replace(
          /aria-label="[^"]*"|<title>.*?<\/title>|<figcaption.*?<\/figcaption>|data-dimension="[^"]*"/g,
          "",
        ),
      ),
    );
    expect(drawings.size).toBe(EVERY_DIMENSION.length);
  });

  it("keeps every line at least 2 px wide when shown 160 px wide", () => {
    for (const dimension of EVERY_DIMENSION) {
      const markup = diagram(dimension);
      const [viewBox = ""] = attributeValues(markup, "viewBox");
      const width = Number(viewBox.split(" ")[2]);
      const pxPerUnit = 160 / width;
      for (const value of attributeValues(markup, "stroke-width")) {
        expect(Number(value) * pxPerUnit, `${dimension} stroke ${value}`).toBeGreaterThanOrEqual(2);
      }
    }
  });

  it("fetches nothing: no images, links or web fonts", () => {
    for (const dimension of EVERY_DIMENSION) {
      const markup = diagram(dimension);
      expect(markup).not.toMatch(/<image|href=|url\(|https?:|@import|<style/);
    }
  });

  it.each(CORNERS)("corner weight highlights only the %s pad and names it", (corner) => {
    const markup = diagram("cornerWeightKg", corner);
    expect(attributeValues(markup, "data-corner")).toEqual([corner]);
    const [label = ""] = attributeValues(markup, "aria-label");
    expect(label).toContain(dimensionLabel("cornerWeightKg", corner));
  });

  it("corner weight without a corner highlights all four pads", () => {
    const markup = diagram("cornerWeightKg");
    expect(attributeValues(markup, "data-corner").sort()).toEqual([...CORNERS].sort());
  });

  it("says where the noise meter goes: 0.5 m from the outlet at 45°", () => {
    // Source: Motorsport UK NCR 2026 Ch.7 App.8 — static test 0.5 m from the outlet at 45°
    const markup = diagram("noiseDbA");
    const [label = ""] = attributeValues(markup, "aria-label");
    expect(label).toContain("0.5 m");
    expect(label).toContain("45°");
  });

  it("overhang says the reading is positive when the wing is behind", () => {
    // Source: common practice (no source) — overhang + when the wing is behind the bodywork
    const [label = ""] = attributeValues(diagram("wingOverhangMm"), "aria-label");
    expect(label).toMatch(/plumb line/);
    expect(label).toMatch(/plus when the wing is behind/);
  });
});
