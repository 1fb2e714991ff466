import "server-only";
import { getEventRoles } from "../../db/queries/get-event-roles";
import { AppError } from "../errors";
import { authorizeEntryRead } from "./authorize-entry-read";
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
  const { roles } = await authorizeEntryRead({ entryId: access.entry(input), user });
  return { user, roles };
}
