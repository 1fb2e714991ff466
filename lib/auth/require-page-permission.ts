import "server-only";
import { forbidden, redirect } from "next/navigation";
import { getEventRoles } from "../../db/queries/get-event-roles";
import type { SignedInCaller as Authorized } from "./authorize-access";
import { getSessionUser, type SessionUser } from "./get-session-user";
import { can, type Permission } from "./permissions";

/** The page form of the guard: sends a signed-out visitor to sign-in, answers 403 otherwise. */
export async function requirePagePermission({
  eventId,
  permission,
  returnTo,
}: {
  eventId: string;
  permission: Permission;
  returnTo: string;
}): Promise<Authorized> {
  const user = await requirePageUser(returnTo);
  const roles = await getEventRoles({ eventId, userId: user.id });
  if (!can(roles, permission)) forbidden();
  return { user, roles };
}

export async function requirePageUser(returnTo: string): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`);
  return user;
}
