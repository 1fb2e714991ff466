import type { AeroGeometry } from "../aero/derive-aero-geometry";
import type { EntryDeclarations } from "../classes/entry-declarations-schema";
import type { Measurand } from "../measurement/combine-linear";
import type { DimensionMap } from "../measurement/summarise-dimensions";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import type { DisplayUnits } from "../units/display-units";

/** The power-to-weight ratio in the rule set's unit, or what is still needed for it. */
export type PowerToWeightFigure =
  | { ok: true; measurand: Measurand; description: string }
  | { ok: false; missing: string[]; reason: string };

/** Everything a class check needs, computed once per entry. */
export type ClassCheckContext = {
  ruleSet: RuleSet;
  display: DisplayUnits;
  declarations: EntryDeclarations;
  dimensions: DimensionMap;
  geometry: AeroGeometry;
  hasWing: boolean;
  hasSplitter: boolean;
  /** null when the rule set has no power-to-weight rule. */
  powerToWeight: PowerToWeightFigure | null;
};
