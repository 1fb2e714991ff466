import "server-only";
import { getEventRoles } from "../../db/queries/get-event-roles";
import { AppError } from "../errors";
import { getSessionUser, type SessionUser } from "./get-session-user";
import { can, type Permission } from "./permissions";
import type { Role } from "./roles";

export type Authorized = { user: SessionUser; roles: Role[] };

/**
 * The one guard for route handlers and server actions: signed in (else 401) and holding the
 * permission in this event (else 403).
 */
export async function requirePermission({
  eventId,
  permission,
}: {
  eventId: string;
  permission: Permission;
}): Promise<Authorized> {
  const user = await getSessionUser();
  if (!user) throw new AppError("unauthenticated", "Sign in first.");
  const roles = await getEventRoles({ eventId, userId: user.id });
  if (!can(roles, permission)) {
    throw new AppError("forbidden", "Your role in this event does not allow that.");
  }
  return { user, roles };
}

/** Signed in, whatever the event (for a person's own garage). */
export async function requireUser(): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) throw new AppError("unauthenticated", "Sign in first.");
  return user;
}
