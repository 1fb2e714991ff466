import type { ClassRules } from "../classes/class-rules-schema";
import { pendingRuleResult } from "../classes/pending-rule-result";
import { dimensionLabel } from "../measurement/dimension-labels";
import { judgeMeasurand } from "../measurement/judge-measurand";
import type { ClassCheckContext } from "../power-to-weight/class-check-context";
import type { ClassRuleId } from "../rule-sets/rule-ids";
import { formatQuantity } from "../units/format-quantity";
import type { RuleResult } from "../verdicts/verdict-schema";
import type { Derived } from "./derive-aero-geometry";

type Show = (valueMm: number) => string;

/**
 * Checks one class's aero rules: wing allowed, wing height, overhang, span against the body,
 * chord, splitter allowed, protrusion and width, diffuser allowed. Rules the class leaves
 * unlimited produce no result. Reasons stop short of the consequence, which the ladder adds.
 */
export function checkAeroRules(cls: ClassRules, ctx: ClassCheckContext): RuleResult[] {
  const out: RuleResult[] = [];
  const onFail = (id: ClassRuleId) => ctx.ruleSet.onViolation[id] ?? "move-up";
  const show = (value: number) => formatQuantity(value, "mm", ctx.display);

  const presence = (id: ClassRuleId, fitted: boolean, what: string, basis: string): RuleResult => ({
    ...pendingRuleResult({
      ruleId: id,
      classId: cls.id,
      unit: "none",
      onFail: onFail(id),
      outcome: "not-applicable",
      decisionRule: "presence",
      reason: "",
    }),
    outcome: fitted ? "fail" : "pass",
    reason: fitted
      ? `${what} ${basis}; ${cls.name} allows none`
      : `No ${what.toLowerCase()}, as ${cls.name} requires`,
  });

  const measured = (
    id: ClassRuleId,
    derived: Derived,
    limitMm: number,
    title: string,
    subject: (value: number, show: Show) => string,
    limitText?: string,
  ): RuleResult => {
    if (!derived.ok) {
      const labels = derived.missing.map((d) => dimensionLabel(d));
      return pendingRuleResult({
        ruleId: id,
        classId: cls.id,
        unit: "mm",
        onFail: onFail(id),
        outcome: "waiting",
        decisionRule: ctx.ruleSet.decisionRule.kind,
        missing: labels,
        reason: `${title}: waiting for the ${labels.join(" and the ")}`,
      });
    }
    const guarded = ctx.ruleSet.decisionRule.kind === "guarded";
    const u = ctx.ruleSet.decisionRule.k * derived.measurand.standardUncertainty;
    const withU: Show = (v) => formatQuantity(v, "mm", ctx.display, guarded ? u : undefined);
    return judgeMeasurand({
      ruleId: id,
      classId: cls.id,
      unit: "mm",
      onFail: onFail(id),
      measurand: derived.measurand,
      limit: limitMm,
      side: "max",
      decisionRule: ctx.ruleSet.decisionRule,
      display: ctx.display,
      subject: () => subject(derived.measurand.value, withU),
      ...(limitText === undefined ? {} : { limitText }),
    });
  };

  const noWing = (id: ClassRuleId) =>
    pendingRuleResult({
      ruleId: id,
      classId: cls.id,
      unit: "mm",
      onFail: onFail(id),
      outcome: "not-applicable",
      decisionRule: ctx.ruleSet.decisionRule.kind,
      reason: "No wing fitted",
    });

  const partValue = (derived: Derived, index: number) =>
    derived.ok ? (derived.measurand.parts[index]?.value ?? 0) : 0;
  const overBody = (allowanceMm: number) =>
    allowanceMm === 0
      ? "the body's width"
      : allowanceMm > 0
        ? `the body's width + ${show(allowanceMm)}`
        : `the body's width − ${show(-allowanceMm)}`;

  const wing = cls.aero.wing;
  const g = ctx.geometry;
  if (!wing.allowed) {
    out.push(presence("wing-allowed", ctx.hasWing, "Wing", "fitted"));
  } else {
    if (wing.height !== null) {
      const { reference, maxMm } = wing.height;
      if (!ctx.hasWing) out.push(noWing("wing-height"));
      else if (reference === "roof-peak") {
        out.push(
          measured(
            "wing-height",
            g.heightAboveRoofMm,
            maxMm,
            "Wing height above the roof",
            (v, s) =>
              v >= 0 ? `Wing top ${s(v)} above the roof` : `Wing top ${s(-v)} below the roof`,
          ),
        );
      } else {
        out.push(
          measured(
            "wing-height",
            g.wingTopFromGroundMm,
            maxMm,
            "Wing height",
            (v, s) => `Wing top ${s(v)} from the ground`,
          ),
        );
      }
    }
    if (wing.maxOverhangMm !== null) {
      if (!ctx.hasWing) out.push(noWing("wing-overhang"));
      else {
        out.push(
          measured(
            "wing-overhang",
            g.overhangMm,
            wing.maxOverhangMm,
            "Wing overhang",
            (v, s) =>
              v >= 0
                ? `Wing ${s(v)} behind the rearmost bodywork`
                : `Wing ${s(-v)} inside the rearmost bodywork`,
            `${show(wing.maxOverhangMm)} behind`,
          ),
        );
      }
    }
    if (wing.span !== null) {
      const { allowanceOverBodyMm, endPlatesCounted } = wing.span;
      const derived = endPlatesCounted ? g.spanOverBodyMm : g.spanOverBodyWithoutEndPlatesMm;
      const bodyIndex = endPlatesCounted ? 1 : 2;
      const plates = endPlatesCounted ? "end plates counted" : "without end plates";
      if (!ctx.hasWing) out.push(noWing("wing-span"));
      else {
        out.push(
          measured(
            "wing-span",
            derived,
            allowanceOverBodyMm,
            "Wing span",
            (v, s) => {
              const body = partValue(derived, bodyIndex);
              return `Wing span ${s(v + body)}, ${plates}, on a body ${show(body)} wide`;
            },
            overBody(allowanceOverBodyMm),
          ),
        );
      }
    }
    if (wing.maxChordMm !== null) {
      if (!ctx.hasWing) out.push(noWing("wing-chord"));
      else
        out.push(
          measured(
            "wing-chord",
            g.chordMm,
            wing.maxChordMm,
            "Wing chord",
            (v, s) => `Wing chord ${s(v)}`,
          ),
        );
    }
  }

  const splitter = cls.aero.splitter;
  if (!splitter.allowed) {
    out.push(presence("splitter-allowed", ctx.hasSplitter, "Splitter", "fitted"));
  } else if (ctx.hasSplitter) {
    if (splitter.maxProtrusionMm !== null) {
      out.push(
        measured(
          "splitter-protrusion",
          g.splitterProtrusionMm,
          splitter.maxProtrusionMm,
          "Splitter protrusion",
          (v, s) =>
            v >= 0
              ? `Splitter ${s(v)} ahead of the bumper`
              : `Splitter ${s(-v)} behind the bumper's front`,
        ),
      );
    }
    if (splitter.width !== null) {
      const derived = g.splitterOverBodyMm;
      out.push(
        measured(
          "splitter-width",
          derived,
          splitter.width.allowanceOverBodyMm,
          "Splitter width",
          (v, s) => {
            const body = partValue(derived, 1);
            return `Splitter ${s(v + body)} wide on a body ${show(body)} wide`;
          },
          overBody(splitter.width.allowanceOverBodyMm),
        ),
      );
    }
  }

  if (!cls.aero.diffuserAllowed) {
    out.push({
      ...presence("diffuser-allowed", ctx.declarations.aero.diffuser, "Diffuser", "declared"),
      decisionRule: "declared",
    });
  }
  return out;
}
