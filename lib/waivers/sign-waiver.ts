import "server-only";
import { v7 as uuidv7 } from "uuid";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { getWaiverFacts } from "../../db/queries/waivers/get-waiver-facts";
import { insertWaiver } from "../../db/queries/waivers/insert-waiver";
import { renewGuardianRequest } from "../../db/queries/waivers/renew-guardian-request";
import { runTransaction, type Tx } from "../../db/run-transaction";
import { enqueuePassReadyMail } from "../entries/enqueue-pass-ready-mail";
import { env } from "../env";
import { AppError } from "../errors";
import { SEND_MAIL } from "../jobs/job-kinds";
import { composeGuardianRequestMail } from "../mail/compose-guardian-request-mail";
import { formatEventDate } from "../run-sheet/format-event-date";
import { isMinorOn } from "../scrutineer/calendar/age-on-date";
import { GUARDIAN_LINK_DAYS } from "./guardian-link-expired";
import { makeGuardianToken } from "./make-guardian-token";
import { namesMatch } from "./names-match";
import type { SignWaiverInput } from "./waiver-input-schemas";

export type SignWaiverResult =
  | { outcome: "signed" }
  | { outcome: "guardian-asked"; guardianEmail: string }
  | { outcome: "already-signed" };

/**
 * One driver accepts an entry's waiver: the name typed must be their profile's full name (case
 * and spacing forgiven), the time (`now`), the address and the text's version are stored on
 * their own row. A driver under 18 on the event date also names a parent or guardian, who is
 * e-mailed a link that works once (only its SHA-256 is kept); a minor who signed already and
 * whose guardian has not accepted gets the request sent again (the old link stops working).
 * When the acceptance completes the entry's sign-on, the pass-ready e-mails are queued with it.
 */
export async function signWaiver({
  input,
  userId,
  ip,
  now,
}: {
  input: SignWaiverInput;
  userId: string;
  ip: string;
  now: Date;
}): Promise<SignWaiverResult> {
  return runTransaction(async (tx) => {
    const facts = await getWaiverFacts({ entryId: input.entryId, lock: true }, tx);
    if (!facts) throw new AppError("not_found", "No such entry.");
    const me =
      facts.driverId === userId
        ? { name: facts.driverName, email: facts.driverEmail, dob: facts.driverDateOfBirth }
        : facts.coDriverId === userId
          ? { name: facts.coDriverName, email: facts.coDriverEmail, dob: facts.coDriverDateOfBirth }
          : null;
    if (!me) {
      throw new AppError(
        "forbidden",
        "Each driver signs for themselves: your account does not allow that on this entry.",
      );
    }
    if (facts.entryStatus === "withdrawn") {
      throw new AppError("conflict", "This entry was withdrawn, so its waiver cannot be signed.");
    }
    if (facts.eventStatus === "finished") {
      throw new AppError("conflict", "This event is over, so its waiver cannot be signed.");
    }
    if (!facts.waiverText || !facts.waiverVersion) {
      throw new AppError("conflict", "The organizer has not published this event's waiver yet.");
    }
    if (!me.name) {
      throw new AppError("conflict", "Add your full name to your profile first, then sign.");
    }
    if (!namesMatch(input.signedName, me.name)) {
      throw new AppError("invalid_input", "The name does not match your profile.", {
        signedName: [
          `Type your full name as your profile gives it (${me.name}); only capitals and spaces may differ.`,
        ],
      });
    }
    const minor = me.dob !== null && isMinorOn(me.dob, facts.eventDate);
    const own = facts.waivers.find((w) => w.signerId === userId);
    // Complete, unless the driver's date of birth now says they are a minor on the day.
    if (own && (!(own.isMinor || minor) || own.guardianSignedAt !== null))
      return { outcome: "already-signed" };
    if (!minor && !own) {
      await insertWaiver(
        {
          id: uuidv7(),
          eventId: facts.eventId,
          entryId: facts.entryId,
          signerId: userId,
          signedName: input.signedName,
          signedAt: now,
          isMinor: false,
          textVersion: facts.waiverVersion,
          signerIp: ip,
        },
        tx,
      );
      await enqueuePassReadyMail({ entryId: facts.entryId }, tx);
      return { outcome: "signed" };
    }
    // A minor (or a minor's row from before): the guardian is asked.
    const guardian = guardianOf(input, me.email, me.name);
    const { token, tokenHash } = makeGuardianToken();
    const waiverId = own?.id ?? uuidv7();
    if (own) {
      await renewGuardianRequest(
        { waiverId, ...guardian, guardianTokenHash: tokenHash, at: now },
        tx,
      );
    } else {
      await insertWaiver(
        {
          id: waiverId,
          eventId: facts.eventId,
          entryId: facts.entryId,
          signerId: userId,
          signedName: input.signedName,
          signedAt: now,
          isMinor: true,
          textVersion: facts.waiverVersion,
          signerIp: ip,
          guardianName: guardian.guardianName,
          guardianEmail: guardian.guardianEmail,
          guardianTokenHash: tokenHash,
          guardianRequestedAt: now,
        },
        tx,
      );
    }
    await queueGuardianRequest(tx, {
      facts,
      minorName: me.name,
      guardian,
      token,
      dedupeKey: `guardian-request:${waiverId}:${tokenHash.slice(0, 16)}`,
    });
    return { outcome: "guardian-asked", guardianEmail: guardian.guardianEmail };
  });
}

function guardianOf(input: SignWaiverInput, ownEmail: string | null, ownName: string) {
  const fields: Record<string, string[]> = {};
  if (!input.guardianName) {
    fields.guardianName = [
      "You are under 18 on the event date: give a parent's or guardian's full name.",
    ];
  } else if (namesMatch(input.guardianName, ownName)) {
    fields.guardianName = ["Give your parent's or guardian's name, not your own."];
  }
  if (!input.guardianEmail) {
    fields.guardianEmail = ["Give your parent's or guardian's e-mail address: they get a link."];
  } else if (input.guardianEmail === ownEmail) {
    fields.guardianEmail = ["That is your own address: give your parent's or guardian's."];
  }
  if (Object.keys(fields).length > 0 || !input.guardianName || !input.guardianEmail) {
    throw new AppError("invalid_input", "A parent or guardian must accept too.", fields);
  }
  return { guardianName: input.guardianName, guardianEmail: input.guardianEmail };
}

async function queueGuardianRequest(
  tx: Tx,
  opts: {
    facts: { eventId: string; eventName: string; eventDate: string; carNumber: number };
    minorName: string;
    guardian: { guardianName: string; guardianEmail: string };
    token: string;
    dedupeKey: string;
  },
) {
  const url = new URL(`/guardian/${opts.token}`, env.APP_URL).toString();
  await enqueueJobs(
    [
      {
        kind: SEND_MAIL,
        payload: {
          to: opts.guardian.guardianEmail,
          ...composeGuardianRequestMail({
            minorName: opts.minorName,
            guardianName: opts.guardian.guardianName,
            eventName: opts.facts.eventName,
            eventDateText: formatEventDate(opts.facts.eventDate),
            carNumber: opts.facts.carNumber,
            url,
            linkDays: GUARDIAN_LINK_DAYS,
          }),
          kind: "guardian-request",
          eventId: opts.facts.eventId,
        },
        dedupeKey: opts.dedupeKey,
      },
    ],
    tx,
  );
}
