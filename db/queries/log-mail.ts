import "server-only";
import { sql } from "drizzle-orm";
import { clock } from "../../lib/clock";
import { getDb } from "../client";
import { mailLog } from "../schema";

/**
 * Append one line to the mail log. A sent mail names the job that sent it (one line per job: a
 * second line for the same job is dropped, so a job run twice still shows one sent mail).
 */
export async function logMail(row: {
  eventId?: string | null;
  toAddress: string;
  subject: string;
  kind: string;
  messageId?: string | null;
  status: "sent" | "failed";
  error?: string | null;
  jobId?: number | null;
}): Promise<void> {
  await getDb()
    .insert(mailLog)
    .values({
      ...row,
      jobId: row.status === "sent" ? (row.jobId ?? null) : null,
      error: row.error?.slice(0, 500) ?? null,
      createdAt: clock.now(),
    })
    .onDuplicateKeyUpdate({ set: { id: sql`${mailLog.id}` } });
}
