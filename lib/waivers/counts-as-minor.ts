import { isMinorOn } from "../scrutineer/calendar/age-on-date";

/**
 * Whether a driver's waiver needs a parent's or guardian's acceptance: it was signed as a minor's,
 * or the driver's date of birth (as it stands now, so a corrected one counts) makes them under 18
 * on the event's date. Pure.
 */
export function countsAsMinor({
  signedAsMinor,
  dateOfBirth,
  eventDate,
}: {
  signedAsMinor: boolean;
  dateOfBirth: string | null;
  eventDate: string;
}): boolean {
  return signedAsMinor || (dateOfBirth !== null && isMinorOn(dateOfBirth, eventDate));
}
