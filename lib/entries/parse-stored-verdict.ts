import { type Verdict, verdictSchema } from "../scrutineer/verdict-schema";

// Entries already reported by this process, so a phone fetching its pack every 15 s does not
// repeat the same line; bounded, and forgotten when full.
const reported = new Set<string>();
// Verdicts already read, by the hash of their stored JSON (`verdicts.result_hash`): the same
// result is parsed once, not on every poll of an entry page or pack. Bounded; the oldest go first.
const parsedByHash = new Map<string, Verdict>();
const MAX_PARSED = 2000;

/**
 * A verdict as stored in `verdicts.result` (JSON), read back through the verdict schema. A row
 * that does not match (stored by another version of the engine, or damaged) is no verdict: the
 * caller shows the car as Waiting, and the server log says which entry and what did not match,
 * so a recompute can put it right. Never throws.
 * @param result the stored JSON, as the driver hands it over
 * @param resultHash the row's `result_hash` (SHA-256 of the stored JSON), when it has one
 */
export function parseStoredVerdict({
  entryId,
  result,
  resultHash = null,
}: {
  entryId: string;
  result: unknown;
  resultHash?: string | null;
}): Verdict | null {
  if (result === null || result === undefined) return null;
  const known = resultHash ? parsedByHash.get(resultHash) : undefined;
  if (known) return known;
  const parsed = verdictSchema.safeParse(result);
  if (parsed.success) {
    if (resultHash) {
      if (parsedByHash.size >= MAX_PARSED) {
        const oldest = parsedByHash.keys().next().value;
        if (oldest !== undefined) parsedByHash.delete(oldest);
      }
      parsedByHash.set(resultHash, parsed.data);
    }
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
