import type { RuleSetDescription } from "../scrutineer/rule-sets/describe-rule-set";

/** Each class in one line for the class picker: its description, else its first limits. */
export function classSummaries(
  description: RuleSetDescription,
): Array<{ id: string; name: string; summary: string }> {
  return description.classes.map((c) => ({
    id: c.id,
    name: c.name,
    summary:
      c.description ??
      c.lines
        .slice(0, 3)
        .map((l) => `${l.label}: ${l.value}`)
        .join(" · "),
  }));
}
