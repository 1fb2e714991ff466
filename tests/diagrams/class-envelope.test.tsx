import { describe, expect, it } from "vitest";
import { ClassEnvelope } from "@/components/diagrams/class-envelope";
import type {
  ClassEnvelopeProps,
  EnvelopeHeightCheck,
  EnvelopeSpanCheck,
} from "@/components/diagrams/envelope/envelope-types";
import { attributeValues, partByTestId, render, textOf } from "./render-markup";

const IN = 25.4; // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly
// Source: Motorsport UK NCR 2026 Ch.14 App.4 — wing top ≤ 200 mm above the roof's highest point,
// rearmost point ≤ 200 mm behind the rearmost bodywork
const HEIGHT_LIMIT_MM = 200;
const OVERHANG_LIMIT_MM = 200;

function envelope(over: {
  height?: Partial<EnvelopeHeightCheck>;
  overhang?: Partial<ClassEnvelopeProps["overhang"]>;
  span?: Partial<EnvelopeSpanCheck>;
  unit?: ClassEnvelopeProps["unit"];
}): string {
  const props: ClassEnvelopeProps = {
    classLabel: "Test class",
    unit: over.unit ?? "mm",
    height: {
      reference: "roof-peak",
      limitMm: HEIGHT_LIMIT_MM,
      measuredMm: 150,
      outcome: "pass",
      ...over.height,
    },
    overhang: { limitMm: OVERHANG_LIMIT_MM, measuredMm: 120, outcome: "pass", ...over.overhang },
    span: {
      limitMm: 0,
      measuredMm: -20,
      outcome: "pass",
      wingSpanMm: 1480,
      bodyWidthMm: 1500,
      endPlatesCounted: true,
      ...over.span,
    },
  };
  return render(<ClassEnvelope {...props} />);
}

function heightPart(markup: string) {
  const part = partByTestId(markup, "envelope-height");
  const [limitY = "NaN"] = attributeValues(part, "data-limit-y");
  const [wingTopY = "NaN"] = attributeValues(part, "data-wing-top-y");
  return { part, text: textOf(part), limitY: Number(limitY), wingTopY: Number(wingTopY) };
}

describe("class envelope", () => {
  it("says over, in the stopped colour, and draws the wing above the line when too high", () => {
    const h = heightPart(envelope({ height: { measuredMm: 205, outcome: "fail" } }));
    expect(h.text).toContain("over");
    expect(h.text).toContain("over by 5 mm");
    expect(h.part).toContain('data-state="over"');
    expect(h.part).toMatch(/class="[^"]*\bfill-stopped\b/);
    expect(h.part).toMatch(/class="[^"]*\bstroke-stopped\b/);
    expect(h.part).not.toMatch(/\b(fill|stroke)-cleared\b/);
    // y grows downward: the wing's top is drawn above (smaller y than) the limit line.
    expect(h.wingTopY).toBeLessThan(h.limitY);
  });

  it("says inside, in the cleared colour, and draws the wing below the line when within", () => {
    const h = heightPart(envelope({ height: { measuredMm: 150, outcome: "pass" } }));
    expect(h.text).toContain("inside");
    expect(h.text).toContain("50 mm inside");
    expect(h.part).toMatch(/class="[^"]*\bfill-cleared\b/);
    expect(h.part).not.toMatch(/\b(fill|stroke)-stopped\b/);
    expect(h.wingTopY).toBeGreaterThan(h.limitY);
  });

  it("says too close to call, in the attention colour, for an inconclusive reading", () => {
    const h = heightPart(
      envelope({ height: { measuredMm: 201, outcome: "inconclusive", uncertaintyMm: 2.8 } }),
    );
    expect(h.text).toContain("too close to call");
    expect(h.text).not.toContain("unsure");
    expect(h.text).toContain("over by 1 mm");
    expect(h.text).toContain("the ± 2.8 mm uncertainty leaves it undecided");
    expect(h.part).toMatch(/class="[^"]*\bfill-attention\b/);
  });

  it("writes the verdict's own margin words when it has them", () => {
    const h = heightPart(
      envelope({ height: { measuredMm: 205, outcome: "fail", marginText: "over by 5 mm" } }),
    );
    expect(h.text).toContain("over by 5 mm");
  });

  it("shows every number in inches when the event shows inches", () => {
    // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly: 203.2 mm = 8 in, 190.5 mm = 7.5 in
    const markup = envelope({
      unit: "in",
      height: { limitMm: 8 * IN, measuredMm: 7.5 * IN, outcome: "pass" },
      overhang: { limitMm: 5 * IN, measuredMm: 4 * IN },
      span: { wingSpanMm: 64.5 * IN, bodyWidthMm: 64.5 * IN, measuredMm: 0 },
    });
    const text = textOf(markup);
    expect(text).toContain("limit 8 in above the roof");
    expect(text).toContain("0.5 in inside");
    expect(text).toContain("limit 5 in behind");
    expect(text).toContain("span 64.5 in");
    expect(text).toContain("exactly on the limit");
    expect(text).not.toMatch(/\d mm\b/);
    expect(text).not.toContain("203.2");
  });

  it("shows 200 mm as 7.87 in", () => {
    // Source: NIST SP 811 App. B.8 — 200 mm = 7.874015748 in; shown to 0.01 in
    const text = textOf(envelope({ unit: "in" }));
    expect(text).toContain("limit 7.87 in above the roof");
    expect(text).toContain("limit 7.87 in behind");
  });

  it("labels a missing measurement as not measured yet and sketches the wing dashed", () => {
    const markup = envelope({
      height: { measuredMm: null, outcome: "waiting" },
      overhang: { measuredMm: null, outcome: "waiting" },
      span: { wingSpanMm: null, measuredMm: null, outcome: "waiting" },
    });
    for (const id of ["envelope-height", "envelope-overhang", "envelope-span"]) {
      const part = partByTestId(markup, id);
      expect(textOf(part), id).toContain("not measured yet");
      expect(part, id).toContain('data-state="waiting"');
    }
    const wings = markup.match(/<g data-part="wing">[\s\S]*?<\/g>/g) ?? [];
    expect(wings).toHaveLength(2);
    for (const wing of wings) expect(wing).toContain("stroke-dasharray");
    const readout = partByTestId(markup, "envelope-readout");
    expect(textOf(readout).match(/not measured yet/g)?.length).toBeGreaterThanOrEqual(3);
  });

  it("puts a wing that is too wide outside the span lines, in the stopped colour", () => {
    const markup = envelope({
      span: { wingSpanMm: 1530, bodyWidthMm: 1500, measuredMm: 30, outcome: "fail" },
    });
    const part = partByTestId(markup, "envelope-span");
    expect(textOf(part)).toContain("over by 30 mm");
    expect(part).toMatch(/class="[^"]*\bfill-stopped\b/);
    const [limitX = "NaN"] = attributeValues(part, "data-limit-right-x");
    const [wingX = "NaN"] = attributeValues(part, "data-wing-right-x");
    expect(Number(wingX)).toBeGreaterThan(Number(limitX));
  });

  it("says there is no limit where the class sets none", () => {
    const markup = envelope({ height: { limitMm: null, outcome: "waiting" } });
    expect(textOf(partByTestId(markup, "envelope-height"))).toContain("no limit");
    expect(partByTestId(markup, "envelope-height")).not.toContain("data-limit-y");
  });

  it("says once, not twice, that a class sets no limit", () => {
    const markup = envelope({
      height: { limitMm: null, measuredMm: 180, outcome: "waiting" },
      overhang: { limitMm: null, measuredMm: 150, outcome: "waiting" },
      span: { limitMm: null, measuredMm: 100, outcome: "waiting", bodyWidthMm: null },
    });
    const readout = textOf(partByTestId(markup, "envelope-readout"));
    expect(readout).toContain("no limit in this class");
    expect(readout).not.toContain("no limit in this class · no limit in this class");
    for (const label of attributeValues(markup, "aria-label")) {
      expect(label).not.toMatch(/no limit in this class; no limit, no limit in this class/);
    }
  });

  it("keeps every line of the rear view inside the drawing when the body is not measured", () => {
    // Semibold Barlow is about 0.56 em per character (the drawings' own estimate, margin-label.tsx).
    const markup = envelope({
      span: {
        limitMm: null,
        measuredMm: null,
        outcome: "waiting",
        wingSpanMm: 1600,
        bodyWidthMm: null,
      },
    });
    const part = partByTestId(markup, "envelope-span");
    const [viewBox = ""] = attributeValues(part, "viewBox");
    const width = Number(viewBox.split(" ")[2]);
    const texts = [
      ...part.matchAll(/<text x="([\d.]+)"[^>]*font-size="(\d+)"[^>]*>([^<]*)<\/text>/g),
    ];
    expect(texts.map((t) => t[3])).toContain("body width not measured yet");
    for (const [, x, size, text = ""] of texts) {
      expect(Number(x) + text.length * Number(size) * 0.56, text).toBeLessThanOrEqual(width);
    }
  });

  it("names the rearmost bodywork below the cut, clear of the car", () => {
    const markup = partByTestId(envelope({}), "envelope-side");
    const cut = /<line x1="0" y1="(\d+)" x2="360" y2="\1" stroke-width="3"/.exec(markup);
    const label = /<text x="[\d.]+" y="([\d.]+)"[^>]*>rearmost bodywork<\/text>/.exec(markup);
    expect(cut).not.toBeNull();
    expect(label).not.toBeNull();
    expect(Number(label?.[1])).toBeGreaterThan(Number(cut?.[1]));
  });

  it("gives each view an accessible label with the numbers and the words", () => {
    const markup = envelope({ height: { measuredMm: 205, outcome: "fail" } });
    const labels = attributeValues(markup, "aria-label");
    expect(labels).toHaveLength(2);
    expect(labels[0]).toContain("205 mm");
    expect(labels[0]).toContain("over, over by 5 mm");
    expect(labels[1]).toContain("Span, end plates counted");
  });
});
