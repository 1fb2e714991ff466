import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { isDemo } from "@/lib/env";
import { type DemoMessage, listDemoMailbox } from "@/lib/mail/list-demo-mailbox";

export const metadata: Metadata = { title: "Demo mailbox" };
export const dynamic = "force-dynamic";

/** Demo only: every e-mail the local mail server received, so a visitor can open sign-in links. */
export default async function DemoMailboxPage({
  searchParams,
}: {
  searchParams: Promise<{ to?: string }>;
}) {
  if (!isDemo) notFound();
  const { to } = await searchParams;
  let messages: DemoMessage[] = [];
  let problem: string | null = null;
  try {
    messages = await listDemoMailbox(to?.trim() || undefined);
  } catch {
    problem = "The local mail server is not answering. Is `npm start` still running?";
  }
  return (
    <div className="space-y-4">
      <h1 className="text-3xl font-bold">Demo mailbox</h1>
      <p>
        Every e-mail Plumbline sent in this demo. This page does not exist in a live deployment.
      </p>
      <form className="flex gap-2">
        <label className="sr-only" htmlFor="mailbox-to">
          Show mail for
        </label>
        <input
          id="mailbox-to"
          name="to"
          className="field-input mt-0"
          placeholder="Filter by address"
          defaultValue={to}
        />
        <button type="submit" className="btn-secondary">
          Filter
        </button>
      </form>
      {problem ? <p className="field-error">{problem}</p> : null}
      {messages.length === 0 && !problem ? <p className="card">No mail yet.</p> : null}
      <ul className="space-y-3">
        {messages.map((m) => (
          <li key={m.id} className="card space-y-2" data-testid="mail-message">
            <p className="text-base text-asphalt-700">
              To {m.to.join(", ")} ·{" "}
              {new Date(m.receivedAt).toLocaleString("en-GB", { timeZone: "UTC" })} UTC
            </p>
            <p className="text-lg font-semibold">{m.subject}</p>
            {m.html ? (
              <section aria-label="HTML part" className="space-y-1">
                <p className="text-sm font-semibold uppercase tracking-wide text-asphalt-700">
                  HTML part
                </p>
                {/* The message's own HTML, drawn in a sandbox: no scripts, no forms, no same-origin
                    access, links open in a new tab. */}
                <iframe
                  title={`HTML part of “${m.subject}”`}
                  srcDoc={`<base target="_blank">${m.html}`}
                  sandbox="allow-popups allow-popups-to-escape-sandbox"
                  className="h-96 w-full rounded border-2 border-asphalt-300 bg-white"
                  data-testid="mail-html"
                />
              </section>
            ) : null}
            <section aria-label="Text part" className="space-y-1">
              <p className="text-sm font-semibold uppercase tracking-wide text-asphalt-700">
                Text part
              </p>
              <MessageText text={m.text} />
            </section>
          </li>
        ))}
      </ul>
    </div>
  );
}

function MessageText({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/\S+)/g);
  return (
    <p className="whitespace-pre-wrap break-words text-base">
      {parts.map((part, i) =>
        /^https?:\/\//.test(part) ? (
          // biome-ignore lint/suspicious/noArrayIndexKey: the split parts have no identity of their own
          <a key={i} href={part} className="font-semibold text-accent underline">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </p>
  );
}
