import { z } from "zod";

// Only the part of a rule-set body we need to print a class; the full rule-set schema lives in
// lib/scrutineer and is checked when the rule set is saved.
const classListSchema = z.object({
  classes: z.array(z.object({ id: z.string(), name: z.string() })),
});

/** Class id → display name from a stored rule-set body; empty when the body has no class list. */
export function classNamesFromRuleSet(body: unknown): Record<string, string> {
  const parsed = classListSchema.safeParse(body);
  if (!parsed.success) return {};
  return Object.fromEntries(parsed.data.classes.map((c) => [c.id, c.name]));
}
