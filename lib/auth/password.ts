import bcrypt from "bcryptjs";

const COST = 10;

/** Hash a password with bcrypt (cost 10). */
export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

// A real hash of a random string: comparing against it when the account does not exist makes a
// failed sign-in take as long as a wrong password, so timing does not reveal which e-mails exist.
let dummyHash: Promise<string> | undefined;

/** Compare a password with a stored hash, or with a dummy hash when there is none. */
export async function verifyPassword(
  password: string,
  hash: string | null | undefined,
): Promise<boolean> {
  dummyHash ??= bcrypt.hash(crypto.randomUUID(), COST);
  const ok = await bcrypt.compare(password, hash ?? (await dummyHash));
  return hash ? ok : false;
}
