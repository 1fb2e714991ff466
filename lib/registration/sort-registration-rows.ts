import type { RegistrationRow } from "./registration-row";
import type { RegistrationView } from "./registration-view-schema";

// Waiver and fee sort with what still needs doing first (ascending), car number breaking ties.
const waiverRank: Record<RegistrationRow["waiver"], number> = {
  missing: 0,
  "needs-guardian": 1,
  signed: 2,
};

const byName = new Intl.Collator("en-GB", { sensitivity: "base", numeric: true });

/** The rows in the order the table shows: by one column, either way; ties by car number. */
export function sortRegistrationRows(
  rows: readonly RegistrationRow[],
  { sort, dir }: Pick<RegistrationView, "sort" | "dir">,
): RegistrationRow[] {
  const sign = dir === "asc" ? 1 : -1;
  const key = (a: RegistrationRow, b: RegistrationRow): number => {
    switch (sort) {
      case "drivers":
        return byName.compare(a.drivers, b.drivers);
      case "waiver":
        return waiverRank[a.waiver] - waiverRank[b.waiver];
      case "fee":
        return Number(a.paid) - Number(b.paid);
      default:
        return a.carNumber - b.carNumber;
    }
  };
  return [...rows].sort((a, b) => sign * key(a, b) || a.carNumber - b.carNumber);
}
