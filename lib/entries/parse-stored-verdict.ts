import { type Verdict, verdictSchema } from "../scrutineer/verdicts/verdict-schema";

// Entries already reported by this process, so a phone fetching its pack every 15 s does not
// repeat the same line; bounded, and forgotten when full.
const reported = new Set<string>();
// Verdicts already read, by entry, with the exact JSON they were read from: the same stored
// result is parsed once, not on every poll of an entry page or pack, and any other content (a
// new verdict, or a row damaged in the database) is read through the schema again. Bounded; the
// oldest go first.
const parsedByEntry = new Map<string, { json: string; verdict: Verdict }>();
const MAX_PARSED = 2000;

/**
 * A verdict as stored in `verdicts.result` (JSON), read back through the verdict schema. A row
 * that does not match (stored by another version of the engine, or damaged) is no verdict: the
 * caller shows the car as Waiting, and the server log says which entry and what did not match,
 * so a recompute can put it right. Never throws.
 * @param result the stored JSON, as the driver hands it over
 */
export function parseStoredVerdict({
  entryId,
  result,
}: {
  entryId: string;
  result: unknown;
}): Verdict | null {
  if (result === null || result === undefined) return null;
  const json = typeof result === "string" ? result : JSON.stringify(result);
  const known = parsedByEntry.get(entryId);
  if (known && known.json === json) return known.verdict;
  const parsed = verdictSchema.safeParse(result);
  if (parsed.success) {
    if (parsedByEntry.size >= MAX_PARSED) {
      const oldest = parsedByEntry.keys().next().value;
      if (oldest !== undefined) parsedByEntry.delete(oldest);
    }
    parsedByEntry.set(entryId, { json, verdict: parsed.data });
    return parsed.data;
  }
  const issues = parsed.error.issues
    .slice(0, 5)
    .map((i) => `${i.path.join(".") || "(whole verdict)"}: ${i.message}`);
  if (reported.has(entryId)) return null;
  if (reported.size >= 1000) reported.clear();
  reported.add(entryId);
  console.error(
    `[verdicts] stored verdict of entry ${entryId} does not match the verdict schema; shown as Waiting until it is recomputed. ${issues.join("; ")}`,
  );
  return null;
}
