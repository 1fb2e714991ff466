import { DEMO_PASSWORD } from "../../db/seed/demo-password";

/** Demo accounts (invented people) — used as sign-in fixtures, never as trade facts. */
export const demo = {
  password: DEMO_PASSWORD,
  organizer: "organizer@brackenmoor.test",
  registrar: "registrar@brackenmoor.test",
  chief: "chief@brackenmoor.test",
  scrutineer: "scrutineer@brackenmoor.test",
  scrutineer2: "scrutineer2@brackenmoor.test",
  clerk: "clerk@brackenmoor.test",
  entrant: "entrant@brackenmoor.test",
  codriver: "codriver@brackenmoor.test",
} as const;
