import type { Measurand } from "./combine-linear";
import type { AeroGeometry } from "./derive-aero-geometry";
import type { DisplayUnits } from "./display-units";
import type { EntryDeclarations } from "./entry-declarations-schema";
import type { RuleSet } from "./rule-set-schema";
import type { DimensionMap } from "./summarise-dimensions";

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
