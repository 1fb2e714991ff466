import { recordSchema, type TechRecord } from "../scrutineer/records/record-schema";

// Records are never updated once stored, so a record read through the schema stays read: a car's
// verdict is re-derived after every batch from all its records, and re-checking the same rows
// each time was most of the worker's work. Each is kept with the exact row it came from, so a row
// changed in the database is read through the schema again. Bounded; the oldest go first.
const readById = new Map<string, { json: string; record: TechRecord }>();
const MAX_KEPT = 50_000;

/**
 * A stored record read back through the record schema (without text maxima, so nothing stored
 * under older limits is lost), or null when the row does not read as a record — damage in the
 * database, which is logged, never dropped in silence.
 */
export function readStoredRecord(row: { id: string; entryId: string }): TechRecord | null {
  // Kept with the exact row it was read from: a row that differs (damage) is read again.
  const json = JSON.stringify(row);
  const known = readById.get(row.id);
  if (known && known.json === json) return known.record;
  const parsed = recordSchema.safeParse(row);
  if (!parsed.success) {
    console.error("[verdicts] a stored record does not read as one", row.id, parsed.error.message);
    return null;
  }
  if (readById.size >= MAX_KEPT) {
    const oldest = readById.keys().next().value;
    if (oldest !== undefined) readById.delete(oldest);
  }
  readById.set(row.id, { json, record: parsed.data });
  return parsed.data;
}
