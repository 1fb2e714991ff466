/** Every demo account's password (demo only; README lists the accounts). */
export const DEMO_PASSWORD = "plumbline-demo";
// bcrypt (cost 10) of DEMO_PASSWORD, made once so seeding stays fast; checked by a unit test.
export const DEMO_PASSWORD_HASH = "$2b$10$E25lQ6BpxoQjF/dBanAsuuKR9i7eOKOoTRXucLyFAXZFsCFHOGr6W";
