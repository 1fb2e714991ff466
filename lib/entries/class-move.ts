import type { VerdictWord } from "../verdict-word";

/** The class an entry was declared in, and the class it runs in when a verdict moved it up. */
export type ClassMove = {
  declared: string;
  /** Set only when the verdict moved the car up into another class; null otherwise. */
  runsIn: string | null;
};

/**
 * Which class to show beside an entry: the declared one, and where the verdict moved it up, the
 * class it now runs in. Other verdicts (held, re-measure, waiting) leave the declared class as
 * the one to show: they move nothing. Names, not ids.
 */
export function classMove({
  declaredClass,
  finalClass,
  status,
}: {
  declaredClass: string;
  finalClass: string | null;
  status: VerdictWord;
}): ClassMove {
  const moved = status === "moved-up" && finalClass !== null && finalClass !== declaredClass;
  return { declared: declaredClass, runsIn: moved ? finalClass : null };
}
