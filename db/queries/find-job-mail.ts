import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { mailLog } from "../schema";

/** The mail a job already sent, if any (a job run again must not send it twice). */
export async function findJobMail({ jobId }: { jobId: number }) {
  const [row] = await getDb()
    .select({ messageId: mailLog.messageId })
    .from(mailLog)
    .where(eq(mailLog.jobId, jobId))
    .limit(1);
  return row ?? null;
}
