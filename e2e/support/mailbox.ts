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
