/** What decides whether an entry may have a pass yet. */
export type PassReadiness = {
  entryStatus: "entered" | "waiting" | "withdrawn";
  /** As the sign-on desk sees it: signed (and co-signed by a guardian for a minor), signed but
   *  waiting for the guardian, or not signed. */
  waiver: "signed" | "needs-guardian" | "missing";
  paid: boolean;
  /** True when the event's local date (plus the margin) is already over. */
  eventOver: boolean;
};

/**
 * Why an entry cannot have a pass yet, as sentences for the entrant; empty when it can. A pass
 * comes after entering, signing the waiver and paying, and only while the event is still ahead.
 */
export function passBlockers(r: PassReadiness): string[] {
  if (r.entryStatus === "withdrawn") return ["This entry was withdrawn, so it has no pass."];
  if (r.entryStatus === "waiting") {
    return ["This entry is on the waiting list: it gets a pass once a place is yours."];
  }
  if (r.eventOver) return ["This event is over, so passes are no longer issued."];
  const blockers: string[] = [];
  if (r.waiver === "missing")
    blockers.push(
      "Every driver of this entry must sign the waiver: the waiver page shows who has not yet.",
    );
  if (r.waiver === "needs-guardian") {
    blockers.push("The waiver needs a parent or guardian to sign it too.");
  }
  if (!r.paid) blockers.push("Pay the entry fee.");
  return blockers;
}
