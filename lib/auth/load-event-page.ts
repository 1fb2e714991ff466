import "server-only";
import { notFound } from "next/navigation";
import { type EventSummary, getEventSummary } from "../../db/queries/get-event-summary";
import { idSchema } from "../http/id-schema";
import type { SignedInCaller as Authorized } from "./authorize-access";
import type { Permission } from "./permissions";
import { requirePagePermission } from "./require-page-permission";

/** For an event page: a real event id (else 404), the permission (else sign-in or 403), the event. */
export async function loadEventPage({
  eventId,
  permission,
  returnTo,
}: {
  eventId: string;
  permission: Permission;
  returnTo: string;
}): Promise<Authorized & { event: EventSummary }> {
  if (!idSchema.safeParse(eventId).success) notFound();
  const authorized = await requirePagePermission({ eventId, permission, returnTo });
  const event = await getEventSummary({ eventId });
  if (!event) notFound();
  return { ...authorized, event };
}
