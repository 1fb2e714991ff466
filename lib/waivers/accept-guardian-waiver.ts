import "server-only";
import { getGuardianWaiver } from "../../db/queries/waivers/get-guardian-waiver";
import { recordGuardianAcceptance } from "../../db/queries/waivers/record-guardian-acceptance";
import { runTransaction } from "../../db/run-transaction";
import { enqueuePassReadyMail } from "../entries/enqueue-pass-ready-mail";
import { AppError } from "../errors";
import { guardianLinkExpired } from "./guardian-link-expired";
import { hashGuardianToken } from "./hash-guardian-token";
import { namesMatch } from "./names-match";
import type { AcceptGuardianWaiverInput } from "./waiver-input-schemas";

/**
 * A parent or guardian accepts a minor's waiver from the link they were e-mailed: the link must
 * be one we sent (its SHA-256 is on the row), not yet used and not expired; the name typed must
 * be the one the request named (case and spacing forgiven). Their address and the time are
 * stored, the link then works no more, and the pass-ready e-mails are queued if that completes
 * the entry's sign-on. No account is needed: the link is the proof.
 */
export async function acceptGuardianWaiver({
  input,
  ip,
  now,
}: {
  input: AcceptGuardianWaiverInput;
  ip: string;
  now: Date;
}): Promise<{ minorName: string; eventName: string }> {
  const tokenHash = hashGuardianToken(input.token);
  return runTransaction(async (tx) => {
    const row = await getGuardianWaiver({ tokenHash, lock: true }, tx);
    if (!row) {
      throw new AppError(
        "not_found",
        "This link is not valid (it may have been replaced by a newer one). Use the latest e-mail.",
      );
    }
    const minorName = row.minorName ?? "the driver";
    if (row.guardianSignedAt !== null) {
      throw new AppError("conflict", "This link has been used already: the waiver is accepted.");
    }
    if (row.guardianRequestedAt === null || guardianLinkExpired(row.guardianRequestedAt, now)) {
      throw new AppError(
        "conflict",
        `This link has expired. Ask ${minorName} to send the request again from their waiver page.`,
      );
    }
    if (row.entryStatus === "withdrawn" || row.eventStatus === "finished") {
      throw new AppError("conflict", "This entry no longer needs the waiver accepted.");
    }
    if (row.guardianName && !namesMatch(input.guardianName, row.guardianName)) {
      throw new AppError("invalid_input", "The name does not match the request.", {
        guardianName: [
          `Type your full name as the request names you (${row.guardianName}); only capitals and spaces may differ. If that name is wrong, ask ${minorName} to send the request again.`,
        ],
      });
    }
    const recorded = await recordGuardianAcceptance(
      { waiverId: row.waiverId, guardianName: input.guardianName, guardianIp: ip, at: now },
      tx,
    );
    if (!recorded) {
      throw new AppError("conflict", "This link has been used already: the waiver is accepted.");
    }
    await enqueuePassReadyMail({ entryId: row.entryId }, tx);
    return { minorName, eventName: row.eventName };
  });
}
