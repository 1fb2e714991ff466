import { mkdtemp, rm } from "node:fs/promises";
import { connect } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type SmtpFake, startSmtpFake } from "../../scripts/fakes/smtp-fake";

// The local mail server the demo and the tests use must outlive a client that hangs up hard
// (a test killing an app server mid-connection): TCP RST, RFC 9293 §3.5.2.
let fake: SmtpFake;
let dir: string;
const port = 20_000 + Math.floor(Math.random() * 20_000);

/** Connect, read the greeting, and return the first line the server sends. */
function greeting(): Promise<string> {
  return new Promise((resolve, reject) => {
    const socket = connect(port, "127.0.0.1");
    socket.once("data", (data) => {
      socket.end("QUIT\r\n");
      resolve(data.toString());
    });
    socket.once("error", reject);
  });
}

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "smtp-fake-"));
  fake = await startSmtpFake({ smtpPort: port, httpPort: port + 1, dir });
});
afterAll(async () => {
  await fake.close();
  await rm(dir, { recursive: true, force: true });
});

describe("the SMTP fake", () => {
  it("keeps serving after a client resets its connection in the middle of a message", async () => {
    // Source: RFC 5321 §3.3 — EHLO, MAIL, RCPT, DATA, then the message; the reset comes halfway
    // through it, as when the app server sending a verdict e-mail is killed.
    const steps = ["EHLO test", "MAIL FROM:<tech@plumbline.test>", "RCPT TO:<a@b.test>", "DATA"];
    await new Promise<void>((resolve) => {
      const socket = connect(port, "127.0.0.1");
      let step = 0;
      socket.on("data", () => {
        const next = steps[step];
        step += 1;
        if (next !== undefined) return void socket.write(`${next}\r\n`);
        socket.write("Subject: half\r\n\r\nhalf a message");
        setTimeout(() => {
          socket.resetAndDestroy();
          setTimeout(resolve, 300);
        }, 50);
      });
    });
    expect(await greeting()).toMatch(/^220 /);
  });
});
