import { describe, expect, it } from "vitest";
import { ClassFitCard } from "@/components/precheck/class-fit-card";
import { precheckWingPlan } from "@/lib/scrutineer/aero/precheck-wing-plan";
import { wingPlanDimensions } from "@/lib/scrutineer/aero/wing-plan-dimensions";
import { type WingPlan, wingPlanSchema } from "@/lib/scrutineer/aero/wing-plan-schema";
import { ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { attributeValues, partByTestId, render, textOf } from "../diagrams/render-markup";
import { clubRuleSet } from "../scrutineer/fixtures";

// Source: common practice (no source) — span no wider than the body, end plates counted; the
// club fixture also limits the wing to 8 in above the roof and 5 in behind the bodywork.
const ruleSet = ruleSetSchema.parse(clubRuleSet());
const inch = (value: number) => ({ value, unit: "in" as const });

/** Two 32 in halves + two ¼ in end plates (64.5 in, common practice (no source)). */
function plan(bodyIn: number, behindIn = 3): WingPlan {
  return wingPlanSchema.parse({
    car: { bodyWidth: inch(bodyIn), roofHeight: inch(52), rearmostBodywork: inch(36) },
    wing: {
      span: { kind: "parts", half: inch(32) },
      endPlate: inch(0.25),
      chord: inch(10),
      height: inch(58),
      mount: { distance: inch(behindIn), direction: "behind" },
    },
  });
}

function card(p: WingPlan): string {
  const [fit] = precheckWingPlan({ plan: p, ruleSet });
  const cls = ruleSet.classes[0];
  if (!fit || !cls) throw new Error("no class");
  return render(
    <ClassFitCard fit={fit} cls={cls} dimensions={wingPlanDimensions(p, 2)} unit="in" />,
  );
}

describe("the pre-check's drawings", () => {
  it("draw the 0.5 in span violation on a 64.0 in body, labelled, behind and from above", () => {
    const markup = card(plan(64));
    expect(markup).toContain('data-fits="false"');
    const rear = partByTestId(markup, "envelope-span");
    expect(rear).toContain('data-state="over"');
    expect(textOf(rear)).toContain("over by 0.5 in");
    // The wing's compared edge is drawn beyond the limit line.
    const [limitX] = attributeValues(rear, "data-limit-right-x").map(Number);
    const [wingX] = attributeValues(rear, "data-wing-right-x").map(Number);
    expect(wingX).toBeGreaterThan(limitX ?? Number.POSITIVE_INFINITY);
    const top = partByTestId(markup, "envelope-top");
    expect(top).toContain('data-state="over"');
    expect(top).toMatch(/data-part="violation" data-limit="span"/);
    expect(textOf(top)).toContain("Span: over by 0.5 in");
    // Height and overhang are inside: the side view says so.
    expect(partByTestId(markup, "envelope-height")).toContain('data-state="inside"');
  });

  it("draw no violation when the same wing sits on a 64.5 in body (exactly on the limit)", () => {
    const markup = card(plan(64.5));
    expect(markup).toContain('data-fits="true"');
    expect(markup).not.toContain('data-part="violation"');
    expect(textOf(partByTestId(markup, "envelope-span"))).toContain("exactly on the limit");
  });

  it("draw an overhang violation from above when the wing reaches too far back", () => {
    // Club fixture: ≤ 5 in behind; 6 in behind is 1 in over.
    const top = partByTestId(card(plan(64.5, 6)), "envelope-top");
    expect(top).toMatch(/data-part="violation" data-limit="overhang"/);
    expect(textOf(top)).toContain("Behind the bodywork: over by 1 in");
  });
});
