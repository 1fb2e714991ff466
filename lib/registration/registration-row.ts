import type { SignOnRecord } from "../entries/sign-on-state";

/** One line of the sign-on desk's table (and of its CSV export). */
export type RegistrationRow = {
  entryId: string;
  carNumber: number;
  /** Driver, and co-driver after " & " when there is one. */
  drivers: string;
  /** Year, make and model. */
  car: string;
  declaredClass: string;
  waiver: SignOnRecord["waiver"];
  paid: boolean;
};

/** The waiver state in the desk's words. */
export const waiverLabels: Record<RegistrationRow["waiver"], string> = {
  signed: "Signed",
  "needs-guardian": "Needs guardian",
  missing: "Not signed",
};
