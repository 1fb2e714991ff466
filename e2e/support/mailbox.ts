/** Read the local SMTP fake's store (the same API the demo mailbox page uses). */
export async function latestLinkFor(address: string, since: number): Promise<string> {
  const mailbox = process.env.MAILBOX_URL ?? "http://127.0.0.1:2780";
  for (let attempt = 0; attempt < 50; attempt += 1) {
    const response = await fetch(`${mailbox}/messages?to=${encodeURIComponent(address)}`);
    const { messages } = (await response.json()) as {
      messages: { receivedAt: string; text: string }[];
    };
    const fresh = messages.find((m) => Date.parse(m.receivedAt) >= since);
    const link = fresh?.text.match(/https?:\/\/\S+/)?.[0];
    if (link) return link;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no sign-in mail for ${address}`);
}

/** A message to `address` received since `since` whose subject matches, waiting up to 15 s for
 *  the worker to send it. */
export async function mailTo(
  address: string,
  since: number,
  subject: RegExp,
): Promise<{ subject: string; text: string }> {
  const mailbox = process.env.MAILBOX_URL ?? "http://127.0.0.1:2780";
  for (let attempt = 0; attempt < 75; attempt += 1) {
    const response = await fetch(`${mailbox}/messages?to=${encodeURIComponent(address)}`);
    const { messages } = (await response.json()) as {
      messages: { receivedAt: string; subject: string; text: string }[];
    };
    const found = messages.find(
      (m) => Date.parse(m.receivedAt) >= since && subject.test(m.subject),
    );
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no mail to ${address} with a subject like ${subject}`);
}
