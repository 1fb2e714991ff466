import "server-only";
import { listEventEntries } from "../../db/queries/list-event-entries";
import { listRegistrationStatus } from "../../db/queries/list-registration-status";
import type { RegistrationRow } from "./registration-row";

/** Every entry of the event (not withdrawn) with what the sign-on desk has for it. The caller
 *  checks the permission first. */
export async function loadRegistrationRows({
  eventId,
}: {
  eventId: string;
}): Promise<RegistrationRow[]> {
  const [entries, status] = await Promise.all([
    listEventEntries({ eventId }),
    listRegistrationStatus({ eventId }),
  ]);
  return entries.map((e) => {
    const s = status.get(e.entryId);
    return {
      entryId: e.entryId,
      carNumber: e.carNumber,
      drivers: [e.driverName, e.coDriverName].filter(Boolean).join(" & "),
      car: `${e.year} ${e.make} ${e.model}`,
      declaredClass: e.declaredClassName,
      waiver: s?.waiver ?? "missing",
      paid: s?.paid ?? false,
    };
  });
}
