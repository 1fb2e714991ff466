import "server-only";
import nodemailer from "nodemailer";
import { env } from "../env";

// SMTP through nodemailer. In the demo and the tests this is the local SMTP fake on 127.0.0.1;
// in live mode point SMTP_HOST/SMTP_PORT at the club's mail provider. Pooled: a few connections
// kept open and reused, instead of a new SMTP conversation (connect, greet, hello) per message.
const globalForMail = globalThis as unknown as { plumblineMail?: nodemailer.Transporter };

export function getMailTransport(): nodemailer.Transporter {
  globalForMail.plumblineMail ??= nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: false,
    pool: true,
    maxConnections: 3,
    maxMessages: 100,
    ignoreTLS: env.PLUMBLINE_MODE === "demo",
    connectionTimeout: 5000,
    // A mail server that takes the connection and then stalls must not hold a job for long.
    socketTimeout: 30_000,
    greetingTimeout: 5000,
  });
  return globalForMail.plumblineMail;
}

/** Close the pooled connections and forget the transport (the worker on its way out, tests). */
export function closeMailTransport(): void {
  globalForMail.plumblineMail?.close();
  globalForMail.plumblineMail = undefined;
}
