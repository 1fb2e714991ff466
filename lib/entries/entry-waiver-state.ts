/** One stored acceptance of an entry's waiver. */
export type WaiverRow = { signerId: string; isMinor: boolean; guardianSignedAt: Date | null };

/** The entry's waiver as the sign-on desk and the pass see it. */
export type EntryWaiverState = "signed" | "needs-guardian" | "missing";

/**
 * Every driver of an entry (the driver and, once they accepted, the co-driver) signs the waiver
 * themselves, and a minor's acceptance is complete only when a parent or guardian has accepted
 * too — common practice (no source). "signed" when every driver's is complete; "needs-guardian"
 * when every driver has signed but a minor's guardian has not; "missing" when a driver has not
 * signed. A signature from someone who is not (or no longer) a driver counts for nothing.
 */
export function entryWaiverState(
  driverIds: readonly (string | null)[],
  waivers: readonly WaiverRow[],
): EntryWaiverState {
  const drivers = driverIds.filter((id): id is string => id !== null);
  let waitingForGuardian = false;
  for (const driverId of drivers) {
    const own = waivers.filter((w) => w.signerId === driverId);
    if (own.length === 0) return "missing";
    if (!own.some((w) => !w.isMinor || w.guardianSignedAt !== null)) waitingForGuardian = true;
  }
  if (drivers.length === 0) return "missing";
  return waitingForGuardian ? "needs-guardian" : "signed";
}
