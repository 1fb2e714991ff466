/**
 * Rows per table as aligned lines for a terminal (`  entries   40`), tables in name order,
 * then a total line.
 */
export function formatRowCounts(rows: ReadonlyMap<string, number>): string[] {
  const names = [...rows.keys()].sort();
  const width = Math.max(5, ...names.map((n) => n.length));
  const counts = names.map((n) => String(rows.get(n) ?? 0));
  const total = counts.reduce((sum, n) => sum + Number(n), 0);
  const digits = Math.max(String(total).length, ...counts.map((c) => c.length));
  return [
    ...names.map((name, i) => `  ${name.padEnd(width)}  ${(counts[i] ?? "0").padStart(digits)}`),
    `  ${"total".padEnd(width)}  ${String(total).padStart(digits)} rows in ${names.length} tables`,
  ];
}
