import "server-only";
import { clock } from "../../lib/clock";
import { getDb } from "../client";
import { mailLog } from "../schema";

/** Append one line to the mail log. */
export async function logMail(row: {
  eventId?: string | null;
  toAddress: string;
  subject: string;
  kind: string;
  messageId?: string | null;
  status: "sent" | "failed";
  error?: string | null;
}): Promise<void> {
  await getDb()
    .insert(mailLog)
    .values({ ...row, error: row.error?.slice(0, 500) ?? null, createdAt: clock.now() });
}
