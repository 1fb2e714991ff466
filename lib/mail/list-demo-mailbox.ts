import "server-only";
import { env } from "../env";

export type DemoMessage = {
  id: string;
  receivedAt: string;
  to: string[];
  subject: string;
  text: string;
  /** The HTML part, when the message has one. */
  html: string | null;
};

/** Read the local mail fake's store (demo only): newest first, optionally for one address. */
export async function listDemoMailbox(to?: string): Promise<DemoMessage[]> {
  const url = new URL("/messages", env.MAILBOX_URL);
  if (to) url.searchParams.set("to", to);
  const response = await fetch(url, { cache: "no-store", signal: AbortSignal.timeout(3000) });
  if (!response.ok) throw new Error(`mailbox answered ${response.status}`);
  const body = (await response.json()) as { messages: DemoMessage[] };
  return body.messages;
}
