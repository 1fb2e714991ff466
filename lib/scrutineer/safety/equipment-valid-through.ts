import { addYearsToDate } from "../calendar/add-years-to-date";
import { endOfMonthDate } from "../calendar/end-of-month-date";
import { isoDateParts } from "../calendar/iso-date-parts";
import type { EquipmentLabel } from "./equipment-label-schema";
import type { ExpiryPolicy } from "./safety-rules-schema";

/** The last valid day an item's label gives under a policy, or why the label cannot say. */
export type ValidThrough =
  | { ok: true; validThrough: string | null }
  | { ok: false; reason: string };

function labelYear(label: EquipmentLabel): number | null {
  if (label.form === "standard-only") return null;
  if (label.form === "date") return isoDateParts(label.date).year;
  return label.year;
}

function labelMonth(label: EquipmentLabel): { year: number; month: number } | null {
  if (label.form === "manufacture-month") return { year: label.year, month: label.month };
  if (label.form === "date") {
    const { year, month } = isoDateParts(label.date);
    return { year, month };
  }
  return null;
}

/**
 * The last calendar day an item is valid, from its label and the standard's expiry policy
 * (null = no expiry). E.g. a label "2020" under end-of-label-year → "2020-12-31"; a seat made
 * 02/2013 under years-from-label-month 5 → "2018-02-28".
 */
export function equipmentValidThrough(label: EquipmentLabel, policy: ExpiryPolicy): ValidThrough {
  switch (policy.kind) {
    case "no-expiry":
      return { ok: true, validThrough: null };
    case "valid-through-date":
      return { ok: true, validThrough: policy.date };
    case "end-of-label-year":
    case "years-after-label-year": {
      if (label.form === "date")
        return { ok: false, reason: "label gives a date, but the expiry policy reads a year" };
      const year = labelYear(label);
      if (year === null) return { ok: false, reason: "label gives no year" };
      const add = policy.kind === "end-of-label-year" ? 0 : policy.years;
      return { ok: true, validThrough: `${year + add}-12-31` };
    }
    case "years-from-label-month": {
      const ym = labelMonth(label);
      if (ym === null) return { ok: false, reason: "label gives no month and year" };
      return { ok: true, validThrough: endOfMonthDate(ym.year + policy.years, ym.month) };
    }
    case "years-from-label-date": {
      if (label.form === "date")
        return { ok: true, validThrough: addYearsToDate(label.date, policy.years) };
      const ym = labelMonth(label);
      if (ym === null) return { ok: false, reason: "label gives no date" };
      return { ok: true, validThrough: endOfMonthDate(ym.year + policy.years, ym.month) };
    }
  }
}
