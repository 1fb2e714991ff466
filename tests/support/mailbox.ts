/** Messages the test SMTP fake received (scripts/fakes/smtp-fake.ts), newest first. */
export type MailboxMessage = {
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
  attachments?: { filename: string | null; contentType: string; content: string }[];
};

export async function listMail(mailboxUrl: string, since: number): Promise<MailboxMessage[]> {
  const { messages } = (await (await fetch(`${mailboxUrl}/messages`)).json()) as {
    messages: MailboxMessage[];
  };
  return messages.filter((m) => Date.parse(m.receivedAt) >= since);
}

/** Wait (bounded, 10 s) for mail matching `match` since `since`; empty when none comes. */
export async function waitForMail(
  mailboxUrl: string,
  since: number,
  match: (m: MailboxMessage) => boolean,
): Promise<MailboxMessage[]> {
  for (let attempt = 0; attempt < 50; attempt += 1) {
    const found = (await listMail(mailboxUrl, since)).filter(match);
    if (found.length > 0) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  return [];
}

/** The first link in a message's text. */
export function linkIn(message: MailboxMessage): string | undefined {
  return message.text.match(/https?:\/\/\S+/)?.[0];
}
