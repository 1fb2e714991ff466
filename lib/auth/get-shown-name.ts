import "server-only";
import { getUserNames } from "@/db/queries/accounts/get-user-names";
import type { SessionUser } from "./get-session-user";
import { personName } from "./person-name";

/**
 * The name the header shows for the signed-in person, read from their account (the session's copy
 * is from sign-in and misses a profile saved since). When the database does not answer, the
 * session's copy.
 */
export async function getShownName(user: SessionUser): Promise<string> {
  try {
    const stored = await getUserNames({ userId: user.id });
    if (stored) return personName(stored);
  } catch {
    // database away: the session's copy will do for a header
  }
  return personName(user);
}
