/** What the sign-on desk records for an entry. */
export type SignOnRecord = {
  /** Signed by every driver of the entry (the driver and an accepted co-driver; a minor's
   *  co-signed by a guardian), every driver signed but a guardian still to accept, or some
   *  driver has not signed (lib/entries/entry-waiver-state.ts). */
  waiver: "signed" | "needs-guardian" | "missing";
  paid: boolean;
};

/** Whether an entry is signed on, and if not, what is missing in words a clerk can read out. */
export type SignOnState = { signedOn: boolean; missing: string[] };

/**
 * An entry is signed on when its waiver is signed — co-signed by a parent or guardian for a
 * minor (common practice (no source)) — and its fee is paid. Anything short of that is listed.
 */
export function signOnState(record: SignOnRecord): SignOnState {
  const missing: string[] = [];
  if (record.waiver === "missing") missing.push("Waiver not signed");
  if (record.waiver === "needs-guardian") {
    missing.push("Waiver needs a parent's or guardian's signature (minor)");
  }
  if (!record.paid) missing.push("Entry fee not paid");
  return { signedOn: missing.length === 0, missing };
}
