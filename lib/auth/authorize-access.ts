import "server-only";
import { getEntryVerdict } from "../../db/queries/get-entry-verdict";
import { getEventRoles } from "../../db/queries/get-event-roles";
import { isOwnEntry } from "../../db/queries/is-own-entry";
import { AppError } from "../errors";
import { getSessionUser, type SessionUser } from "./get-session-user";
import { can } from "./permissions";
import type { Role } from "./roles";
import type { RouteAccess } from "./route-access";

/** The caller as the guard found them: null user only where the access is public. */
export type Caller = { user: SessionUser | null; roles: Role[] };
/** A signed-in caller. */
export type SignedInCaller = { user: SessionUser; roles: Role[] };

/**
 * The one guard: 401 when a signed-in person is needed and there is none, 403 when their roles
 * in the event do not allow it, 404 for an entry that does not exist.
 */
export async function authorizeAccess<P>(access: RouteAccess<P>, input: P): Promise<Caller> {
  if ("public" in access) return { user: await getSessionUser(), roles: [] };
  const user = await getSessionUser();
  if (!user) throw new AppError("unauthenticated", "Sign in first.");
  if ("signedIn" in access) return { user, roles: [] };
  if ("permission" in access) {
    const roles = await getEventRoles({ eventId: access.eventId(input), userId: user.id });
    if (!can(roles, access.permission)) {
      throw new AppError("forbidden", "Your role in this event does not allow that.");
    }
    return { user, roles };
  }
  const entryId = access.entry(input);
  const row = await getEntryVerdict({ entryId });
  if (!row) throw new AppError("not_found", "No such entry.");
  const [own, roles] = await Promise.all([
    isOwnEntry({ entryId, userId: user.id }),
    getEventRoles({ eventId: row.eventId, userId: user.id }),
  ]);
  if (!(own && can(roles, "own-entries.read")) && !can(roles, "entries.read")) {
    throw new AppError("forbidden", "This entry is not yours to see.");
  }
  return { user, roles };
}
