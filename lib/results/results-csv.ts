import { stringify } from "csv-stringify/sync";

/**
 * Rows as a CSV file for a spreadsheet: RFC 4180 (comma-separated, CRLF line ends, fields with
 * commas, quotes or line breaks quoted, quotes doubled) with a header line, UTF-8 with a byte
 * order mark so a spreadsheet opened by double-click reads names with accents as UTF-8 rather
 * than the machine's legacy code page (common practice (no source)). Text a spreadsheet would run
 * as a formula (starting =, +, -, @, tab or CR) gets a leading apostrophe: names are typed by
 * entrants (OWASP, CSV injection).
 */
export function resultsCsv(
  columns: readonly string[],
  rows: readonly (readonly (string | number)[])[],
): string {
  return stringify(
    rows.map((r) => [...r]),
    {
      header: true,
      columns: [...columns],
      bom: true,
      record_delimiter: "windows",
      // A line break inside a field (CR or LF alone too) must be quoted, not read as a new record.
      quoted_match: /[\r\n]/,
      escape_formulas: true,
    },
  );
}
