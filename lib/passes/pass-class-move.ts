import { type ClassMove, classMove } from "../entries/class-move";
import type { VerdictWord } from "../verdict-word";

/** The class line a pass shows for an entry (names from the event's rule set): the declared
 *  class, and the class the stored verdict runs it in where it moved the car up. */
export function passClassMove(entry: {
  declaredClass: string;
  finalClass: string | null;
  verdictStatus: VerdictWord;
  classNames: Record<string, string>;
}): ClassMove {
  const name = (id: string) => entry.classNames[id] ?? id;
  return classMove({
    declaredClass: name(entry.declaredClass),
    finalClass: entry.finalClass ? name(entry.finalClass) : null,
    status: entry.verdictStatus,
  });
}
