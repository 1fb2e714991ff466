import { isoDateParts } from "../calendar/iso-date-parts";
import { describeEquipmentLabel } from "./describe-equipment-label";
import type { EquipmentLabel, LabelForm } from "./equipment-label-schema";
import type { SafetyStandard } from "./safety-rules-schema";

/** What each label form carries, as said to a scrutineer. */
const FORM_CONTENTS: Record<LabelForm, string> = {
  "not-valid-after-year": 'a "not valid after" year',
  "manufacture-year": "the year of manufacture",
  "manufacture-month": "the month and year of manufacture",
  date: "a date",
  "standard-only": "only the standard, no date",
};

/**
 * Why a recorded label cannot be trusted as read, or null when it can. A label recorded in
 * another form than the standard's (e.g. a "not valid after" year for a standard whose labels
 * carry the year of manufacture) would be computed on the wrong basis; a manufacture year,
 * month or check date after the event day cannot be right. Either way the label is re-read,
 * never passed.
 * @param eventDate ISO "YYYY-MM-DD" in the venue's time zone
 * @returns e.g. `label recorded as "not valid after 2030", but FIA 8853-2016 labels carry the
 *   year of manufacture`
 */
export function labelReadingProblem(args: {
  standard: SafetyStandard;
  label: EquipmentLabel;
  eventDate: string;
}): string | null {
  const { standard, label, eventDate } = args;
  const recorded = describeEquipmentLabel(label);
  const asRecorded = recorded === null ? "with no date or year" : `as ${recorded}`;
  if (label.form !== standard.labelForm) {
    return `label recorded ${asRecorded}, but ${standard.name} labels carry ${FORM_CONTENTS[standard.labelForm]}`;
  }
  const event = isoDateParts(eventDate);
  const after =
    label.form === "date"
      ? label.date > eventDate
      : label.form === "manufacture-year"
        ? label.year > event.year
        : label.form === "manufacture-month"
          ? label.year * 12 + label.month > event.year * 12 + event.month
          : false;
  return after ? `label recorded ${asRecorded}, after the event day (${eventDate})` : null;
}
