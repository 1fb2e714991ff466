import "server-only";
import { getEntryVerdict } from "../../db/queries/get-entry-verdict";
import { getEventRoles } from "../../db/queries/get-event-roles";
import { isOwnEntry } from "../../db/queries/is-own-entry";
import { AppError } from "../errors";
import type { SessionUser } from "./get-session-user";
import { can } from "./permissions";
import type { Role } from "./roles";

/** An entry row as `getEntryVerdict` reads it. */
export type EntryVerdictRow = NonNullable<Awaited<ReturnType<typeof getEntryVerdict>>>;

/**
 * The one rule for who may see an entry: its driver, co-driver or car owner, or an official of
 * its event who may read entries. 404 for an entry that does not exist, 403 for anyone else.
 */
export async function authorizeEntryRead({
  entryId,
  user,
}: {
  entryId: string;
  user: SessionUser;
}): Promise<{ row: EntryVerdictRow; roles: Role[] }> {
  const row = await getEntryVerdict({ entryId });
  if (!row) throw new AppError("not_found", "No such entry.");
  const [own, roles] = await Promise.all([
    isOwnEntry({ entryId, userId: user.id }),
    getEventRoles({ eventId: row.eventId, userId: user.id }),
  ]);
  if (!(own && can(roles, "own-entries.read")) && !can(roles, "entries.read")) {
    throw new AppError("forbidden", "This entry is not yours to see.");
  }
  return { row, roles };
}
