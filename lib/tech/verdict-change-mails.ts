import { randomUUID } from "node:crypto";
import type { NewJob } from "../../db/queries/jobs/enqueue-jobs";
import { SEND_MAIL, type SendMailPayload } from "../jobs/job-kinds";
import { composeVerdictMail } from "../mail/compose-verdict-mail";
import type { RuleSet } from "../scrutineer/rule-sets/rule-set-schema";
import type { VerdictChange } from "./recompute-verdicts";
import { verdictMoved } from "./verdict-moved";

export type EntryContact = {
  entryId: string;
  carNumber: number;
  eventName: string;
  driverEmail: string | null;
  coDriverEmail: string | null;
};

/**
 * The e-mail jobs for verdicts that changed to something other than Waiting: one per driver and
 * co-driver, keyed by entry, the change's time and address, so the same change enqueued twice
 * sends once.
 */
export function verdictChangeMails({
  eventId,
  changes,
  contacts,
  ruleSet,
  computedAt,
  appUrl,
}: {
  eventId: string;
  changes: VerdictChange[];
  contacts: EntryContact[];
  ruleSet: RuleSet;
  computedAt: Date;
  appUrl: string;
}): NewJob[] {
  const byEntry = new Map(contacts.map((c) => [c.entryId, c]));
  return changes
    .filter((c) => c.verdict.status !== "waiting" && verdictMoved(c))
    .flatMap((change) => {
      const contact = byEntry.get(change.entryId);
      if (!contact) return [];
      const className = ruleSet.classes.find((c) => c.id === change.verdict.classId)?.name ?? null;
      const mail = composeVerdictMail({
        carNumber: contact.carNumber,
        eventName: contact.eventName,
        status: change.verdict.status,
        className,
        reason: change.verdict.reason,
        entryUrl: new URL(`/entries/${change.entryId}`, appUrl).toString(),
        notice: change.verdict.notice,
      });
      return [contact.driverEmail, contact.coDriverEmail].flatMap((to) =>
        to
          ? [
              {
                kind: SEND_MAIL,
                payload: {
                  ...mail,
                  to,
                  kind: "verdict",
                  eventId,
                  messageId: `<${randomUUID()}@${new URL(appUrl).hostname}>`,
                } satisfies SendMailPayload,
                dedupeKey: `verdict:${change.entryId}:${computedAt.getTime()}:${to}`,
              },
            ]
          : [],
      );
    });
}
