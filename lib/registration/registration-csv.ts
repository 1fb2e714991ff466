import { stringify } from "csv-stringify/sync";
import { type RegistrationRow, waiverLabels } from "./registration-row";

/**
 * The sign-on desk's table as CSV (RFC 4180: comma-separated, CRLF line ends, fields with commas,
 * quotes or line breaks quoted, quotes doubled), with a header line. Text that a spreadsheet
 * would run as a formula (starting =, +, -, @, tab or CR) gets a leading apostrophe — a driver's
 * name is typed by the entrant (OWASP, CSV injection).
 */
export function registrationCsv(rows: readonly RegistrationRow[]): string {
  return stringify(
    rows.map((r) => [
      r.carNumber,
      r.drivers,
      r.car,
      r.declaredClass,
      waiverLabels[r.waiver],
      r.paid ? "Paid" : "Not paid",
    ]),
    {
      header: true,
      columns: ["Car", "Driver(s)", "Car make and model", "Class", "Waiver", "Fee"],
      record_delimiter: "windows",
      // A line break inside a field (CR or LF alone too) must be quoted, not read as a new record.
      quoted_match: /[\r\n]/,
      escape_formulas: true,
    },
  );
}
