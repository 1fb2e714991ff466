/** What one line of a `mariadb-dump` file (made with `dumpArguments`) says. */
export type DumpLine =
  | { kind: "table"; table: string }
  | { kind: "row"; table: string }
  | { kind: "completed" }
  | { kind: "other" };

const createTable = /^CREATE TABLE `((?:[^`]|``)+)` \($/;
const insertRow = /^INSERT INTO `((?:[^`]|``)+)` VALUES \(/;

/**
 * Classify one line of a dump: a table's definition, one row (the dump has one row per INSERT;
 * a value's line breaks are written as `\n`, so no row spans lines or starts one), or the
 * closing "-- Dump completed" comment `mariadb-dump` writes only when it finished.
 */
export function readDumpLine(line: string): DumpLine {
  const table = createTable.exec(line);
  if (table?.[1]) return { kind: "table", table: table[1].replaceAll("``", "`") };
  const row = insertRow.exec(line);
  if (row?.[1]) return { kind: "row", table: row[1].replaceAll("``", "`") };
  if (line.startsWith("-- Dump completed")) return { kind: "completed" };
  return { kind: "other" };
}
