import { storedEntryDeclarationsSchema } from "../scrutineer/classes/entry-declarations-schema";
import type { TechRecord } from "../scrutineer/records/record-schema";
import type { RuleSet } from "../scrutineer/rule-sets/rule-set-schema";
import { displayUnits } from "../scrutineer/units/display-units";
import { evaluateEntry } from "../scrutineer/verdicts/evaluate-entry";
import type { Verdict } from "../scrutineer/verdicts/verdict-schema";

/**
 * The phone's preview of a verdict: the very function the server runs, on the records this phone
 * knows. Labelled a preview on screen; the server's verdict is the one that counts.
 */
export function previewVerdict(opts: {
  ruleSet: RuleSet;
  entry: { entryId: string; declaredClassId: string; declarations: unknown };
  records: TechRecord[];
  eventDate: string;
  unitSystem: "mm" | "in";
}): Verdict | null {
  const declarations = storedEntryDeclarationsSchema.safeParse(opts.entry.declarations);
  if (!declarations.success) return null;
  if (!opts.ruleSet.classes.some((c) => c.id === opts.entry.declaredClassId)) return null;
  return evaluateEntry({
    ruleSet: opts.ruleSet,
    entry: {
      entryId: opts.entry.entryId,
      declaredClassId: opts.entry.declaredClassId,
      declarations: declarations.data,
    },
    records: opts.records,
    eventDate: opts.eventDate,
    display: displayUnits({ length: opts.unitSystem }),
  });
}
