import "server-only";
import { getEntrySignOnFacts } from "../../db/queries/entries/get-entry-sign-on-facts";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import type { Tx } from "../../db/run-transaction";
import { env } from "../env";
import { SEND_MAIL } from "../jobs/job-kinds";
import { composePassReadyMail } from "../mail/compose-pass-ready-mail";
import { formatEventDate } from "../run-sheet/format-event-date";
import { entryWaiverState } from "./entry-waiver-state";
import { signOnState } from "./sign-on-state";

/**
 * When the entry is now signed on (every driver's waiver complete and the fee paid) and in the
 * field, queue one pass-ready e-mail per driver, in the caller's transaction. The dedupe key
 * `pass-ready:<entryId>:<userId>` makes calling it again (another waiver, a repeated payment
 * webhook) send nothing twice. Call it after anything that can complete sign-on.
 */
export async function enqueuePassReadyMail({ entryId }: { entryId: string }, tx: Tx) {
  const facts = await getEntrySignOnFacts({ entryId }, tx);
  if (facts?.entryStatus !== "entered") return;
  const waiver = entryWaiverState([facts.driverId, facts.coDriverId], facts.waivers);
  if (!signOnState({ waiver, paid: facts.paid }).signedOn) return;
  const passUrl = new URL(`/entries/${entryId}/pass`, env.APP_URL).toString();
  const drivers = [
    { id: facts.driverId, name: facts.driverName, email: facts.driverEmail },
    ...(facts.coDriverId && facts.coDriverEmail
      ? [{ id: facts.coDriverId, name: facts.coDriverName, email: facts.coDriverEmail }]
      : []),
  ];
  await enqueueJobs(
    drivers.map((d) => ({
      kind: SEND_MAIL,
      payload: {
        to: d.email,
        ...composePassReadyMail({
          driverName: d.name ?? d.email,
          eventName: facts.eventName,
          eventDateText: formatEventDate(facts.eventDate),
          carNumber: facts.carNumber,
          passUrl,
        }),
        kind: "pass-ready",
        eventId: facts.eventId,
      },
      dedupeKey: `pass-ready:${entryId}:${d.id}`,
    })),
    tx,
  );
}
