import "server-only";
import { findJobMail } from "../../db/queries/find-job-mail";
import { sendMail } from "../mail/send-mail";
import { faultPoint } from "./fault-point";
import { sendMailPayload } from "./job-kinds";

/**
 * Send a job's e-mail once. A job run again (its worker died before marking it done) finds the
 * mail-log line of the first run and sends nothing. SMTP has no way to take a message back or to
 * ask whether one arrived, so one gap stays: a worker killed between the mail server's "250 OK"
 * and the log line sends it again on the next run — with the same Message-ID, which mail systems
 * commonly treat as one message.
 */
export async function runMailJob({ id, payload }: { id: number; payload: unknown }): Promise<void> {
  if (await findJobMail({ jobId: id })) return;
  const mail = sendMailPayload.parse(payload);
  await sendMail(mail, { jobId: id });
  faultPoint("worker:mail-sent");
}
