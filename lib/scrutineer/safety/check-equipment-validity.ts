import { daysBetweenDates } from "../calendar/days-between-dates";
import type { EquipmentLabel } from "./equipment-label-schema";
import { equipmentValidThrough } from "./equipment-valid-through";
import { labelReadingProblem } from "./label-reading-problem";
import type { SafetyStandard } from "./safety-rules-schema";

/** Validity of one item on the event date. */
export type EquipmentValidity = {
  status: "valid" | "expires-soon" | "expired" | "unreadable";
  /** Last valid day, ISO; null for no expiry or an unreadable label. */
  validThrough: string | null;
  /** Days from the event date to the last valid day (0 = the event day is the last). */
  daysLeft: number | null;
  /** Why the label cannot be trusted as read, when unreadable; follows the item's name ("label recorded as …"). */
  problem: string | null;
};

/**
 * Whether certified equipment is valid on the event date (the venue's calendar date):
 * unreadable when the label was recorded in another form than the standard's or dated after the
 * event day (re-read it; never computed as if valid); expired after its last valid day; "expires-soon" when the last valid day is no more than
 * `warningDays` after the event date; otherwise valid.
 * @param eventDate ISO "YYYY-MM-DD" in the venue's time zone
 */
export function checkEquipmentValidity(args: {
  standard: SafetyStandard;
  label: EquipmentLabel;
  eventDate: string;
  warningDays: number;
}): EquipmentValidity {
  const problem = labelReadingProblem(args);
  if (problem !== null)
    return { status: "unreadable", validThrough: null, daysLeft: null, problem };
  const through = equipmentValidThrough(args.label, args.standard.policy);
  if (!through.ok)
    return { status: "unreadable", validThrough: null, daysLeft: null, problem: through.reason };
  if (through.validThrough === null)
    return { status: "valid", validThrough: null, daysLeft: null, problem: null };
  const daysLeft = daysBetweenDates(args.eventDate, through.validThrough);
  const status = daysLeft < 0 ? "expired" : daysLeft <= args.warningDays ? "expires-soon" : "valid";
  return { status, validThrough: through.validThrough, daysLeft, problem: null };
}
