// A local stand-in for a hosted mail service: an SMTP server (smtp-server) on 127.0.0.1 that keeps
// every message it receives, and a small HTTP API on 127.0.0.1 to read them back (demo mailbox, tests).
import { mkdir, readdir, readFile, rm, writeFile } from "node:fs/promises";
import { createServer } from "node:http";
import type { Server } from "node:net";
import path from "node:path";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

export type StoredMessage = {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  /** The Message-ID header as sent (a job's mail sent twice would show the same one twice). */
  messageId: string | null;
  text: string;
  html: string | null;
  /** Files sent with it (text files, as Plumbline sends: an entrant's calendar). */
  attachments: { filename: string | null; contentType: string; content: string }[];
};

export type SmtpFake = { close: () => Promise<void>; smtpPort: number; httpPort: number };

/** Start the SMTP fake and its mailbox API. Messages persist as JSON files in `dir`. */
export async function startSmtpFake(opts: {
  smtpPort: number;
  httpPort: number;
  dir: string;
}): Promise<SmtpFake> {
  await mkdir(opts.dir, { recursive: true });
  let counter = 0;

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    banner: "Plumbline local mail fake",
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          const receivedAt = new Date();
          counter += 1;
          const id = `${receivedAt.getTime()}-${String(counter).padStart(4, "0")}`;
          const message: StoredMessage = {
            id,
            receivedAt: receivedAt.toISOString(),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
            to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
            subject: mail.subject ?? "",
            messageId: mail.messageId ?? null,
            text: mail.text ?? "",
            html: typeof mail.html === "string" ? mail.html : null,
            attachments: mail.attachments.map((a) => ({
              filename: a.filename ?? null,
              contentType: a.contentType,
              content: a.content.toString("utf8"),
            })),
          };
          await writeFile(path.join(opts.dir, `${id}.json`), JSON.stringify(message));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });

  // A client that hangs up mid-conversation (an app server a test stops or kills while its
  // transport holds a connection) ends that connection, not the mail server: without a
  // listener, SMTPServer's 'error' event would throw and take the whole test run down.
  smtp.on("error", (error: Error & { code?: string }) => {
    console.warn(`[smtp-fake] a client connection failed: ${error.code ?? error.message}`);
  });

  const http = createServer((req, res) => {
    handleMailboxRequest(opts.dir, req.method ?? "GET", new URL(req.url ?? "/", "http://x"))
      .then(({ status, body }) => {
        res.writeHead(status, { "content-type": "application/json" });
        res.end(JSON.stringify(body));
      })
      .catch((error: Error) => {
        res.writeHead(500, { "content-type": "application/json" });
        res.end(JSON.stringify({ error: error.message }));
      });
  });

  await listen(smtp.server, opts.smtpPort);
  await listen(http, opts.httpPort);

  return {
    smtpPort: opts.smtpPort,
    httpPort: opts.httpPort,
    close: async () => {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      await new Promise<void>((resolve) => http.close(() => resolve()));
    },
  };
}

async function handleMailboxRequest(
  dir: string,
  method: string,
  url: URL,
): Promise<{ status: number; body: unknown }> {
  if (url.pathname === "/health") return { status: 200, body: { ok: true } };
  if (url.pathname !== "/messages") return { status: 404, body: { error: "not found" } };
  if (method === "DELETE") {
    for (const file of await readdir(dir)) await rm(path.join(dir, file));
    return { status: 200, body: { deleted: true } };
  }
  const to = url.searchParams.get("to")?.toLowerCase();
  const files = (await readdir(dir))
    .filter((f) => f.endsWith(".json"))
    .sort()
    .reverse();
  const messages: StoredMessage[] = [];
  for (const file of files.slice(0, 200)) {
    const message = JSON.parse(await readFile(path.join(dir, file), "utf8")) as StoredMessage;
    if (!to || message.to.includes(to)) messages.push(message);
  }
  return { status: 200, body: { messages } };
}

function listen(server: Server, port: number): Promise<void> {
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
}
