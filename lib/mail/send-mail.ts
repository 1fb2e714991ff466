import "server-only";
import { logMail } from "../../db/queries/log-mail";
import { whileDatabaseAway } from "../../db/while-database-away";
import { env } from "../env";
import { getMailTransport } from "./mail-transport";

export type OutgoingMail = {
  to: string;
  subject: string;
  text: string;
  html: string;
  kind: string;
  eventId?: string | null;
  /** A Message-ID made when the mail was queued (the same on every attempt). */
  messageId?: string;
  attachments?: { filename: string; contentType: string; content: string }[];
};

/**
 * Send one e-mail and record it in the mail log, whether it went or not. From a job, the mail
 * carries the Message-ID made when it was queued, so a copy sent again after a crash is the same
 * message,
 * and the line saying it went is written even if the database is away for a while (retried), so
 * a database restart never makes the job send it twice.
 */
export async function sendMail(
  mail: OutgoingMail,
  { jobId }: { jobId?: number } = {},
): Promise<void> {
  const messageId = mail.messageId;
  let info: { messageId: string };
  try {
    info = await getMailTransport().sendMail({
      from: env.MAIL_FROM,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      ...(messageId ? { messageId } : {}),
      ...(mail.attachments ? { attachments: mail.attachments } : {}),
    });
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    await logMail({ ...mail, toAddress: mail.to, status: "failed", error: message }).catch(
      () => undefined,
    );
    throw error;
  }
  await whileDatabaseAway(() =>
    logMail({
      ...mail,
      toAddress: mail.to,
      messageId: info.messageId,
      status: "sent",
      jobId: jobId ?? null,
    }),
  );
}
