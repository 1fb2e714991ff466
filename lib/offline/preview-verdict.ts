import { displayUnits } from "../scrutineer/display-units";
import { storedEntryDeclarationsSchema } from "../scrutineer/entry-declarations-schema";
import { evaluateEntry } from "../scrutineer/evaluate-entry";
import type { TechRecord } from "../scrutineer/record-schema";
import type { RuleSet } from "../scrutineer/rule-set-schema";
import type { Verdict } from "../scrutineer/verdict-schema";

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
