import type { TableFingerprint } from "./table-fingerprints";

/** One way a table differs between two copies of a database. */
export type TableDifference = {
  table: string;
  what: "missing" | "extra" | "rows" | "checksum" | "definition";
};

/**
 * Every difference between an original database's tables and a copy's: a table missing from the
 * copy or only in it, or a table whose row count, checksum or definition differs. Empty when
 * the copy is the same.
 */
export function compareTableFingerprints(
  original: ReadonlyMap<string, TableFingerprint>,
  copy: ReadonlyMap<string, TableFingerprint>,
): TableDifference[] {
  const differences: TableDifference[] = [];
  for (const [table, a] of original) {
    const b = copy.get(table);
    if (!b) differences.push({ table, what: "missing" });
    else {
      if (a.rows !== b.rows) differences.push({ table, what: "rows" });
      if (a.checksum !== b.checksum) differences.push({ table, what: "checksum" });
      if (a.definition !== b.definition) differences.push({ table, what: "definition" });
    }
  }
  for (const table of copy.keys()) {
    if (!original.has(table)) differences.push({ table, what: "extra" });
  }
  return differences;
}
