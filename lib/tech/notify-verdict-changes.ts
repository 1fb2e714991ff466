import "server-only";
import { listEntryContacts } from "../../db/queries/list-entry-contacts";
import { env } from "../env";
import { composeVerdictMail } from "../mail/compose-verdict-mail";
import { sendMail } from "../mail/send-mail";
import type { RuleSet } from "../scrutineer/rule-set-schema";
import type { VerdictChange } from "./recompute-verdicts";
import { verdictMoved } from "./verdict-moved";

/**
 * E-mail the driver (and co-driver) of each entry whose verdict changed to something other than
 * Waiting. A mail that cannot be sent is logged, never a reason to refuse the tech line's records.
 */
export async function notifyVerdictChanges({
  eventId,
  changes,
  ruleSet,
}: {
  eventId: string;
  changes: VerdictChange[];
  ruleSet: RuleSet;
}): Promise<number> {
  const changed = changes.filter((c) => c.verdict.status !== "waiting" && verdictMoved(c));
  if (changed.length === 0) return 0;
  const contacts = new Map(
    (await listEntryContacts({ eventId, entryIds: changed.map((c) => c.entryId) })).map((c) => [
      c.entryId,
      c,
    ]),
  );
  let sent = 0;
  for (const change of changed) {
    const contact = contacts.get(change.entryId);
    if (!contact) continue;
    const className = ruleSet.classes.find((c) => c.id === change.verdict.classId)?.name ?? null;
    const mail = composeVerdictMail({
      carNumber: contact.carNumber,
      eventName: contact.eventName,
      status: change.verdict.status,
      className,
      reason: change.verdict.reason,
      entryUrl: new URL(`/entries/${change.entryId}`, env.APP_URL).toString(),
      notice: change.verdict.notice,
    });
    for (const to of [contact.driverEmail, contact.coDriverEmail]) {
      if (!to) continue;
      try {
        await sendMail({ ...mail, to, kind: "verdict", eventId });
        sent += 1;
      } catch (error) {
        console.error(
          "[mail] verdict mail not sent",
          to,
          error instanceof Error ? error.message : error,
        );
      }
    }
  }
  return sent;
}
