// Start the local fakes of hosted services on 127.0.0.1: SMTP + mailbox API, S3 storage, payments.
// Used by `npm start` (scripts/start.sh) and by the Playwright run. Stops on SIGINT/SIGTERM,
// and by itself when the process that started it is gone.
import path from "node:path";
import { env } from "../lib/env";
import { startPaymentsFake } from "./fakes/payments-fake";
import { startS3Fake } from "./fakes/s3-fake";
import { startSmtpFake } from "./fakes/smtp-fake";

const root = path.resolve(import.meta.dirname, "..");
const dataDir = process.env.PLUMBLINE_SERVICES_DIR ?? path.join(root, ".data", "services");
const mailboxPort = Number(new URL(env.MAILBOX_URL).port);
const s3Port = Number(new URL(env.S3_ENDPOINT).port);
const paymentsPort = Number(new URL(env.PAYMENTS_URL).port);

const smtp = await startSmtpFake({
  smtpPort: env.SMTP_PORT,
  httpPort: mailboxPort,
  dir: path.join(dataDir, `mailbox-${env.SMTP_PORT}`),
});
const s3 = await startS3Fake({
  port: s3Port,
  dir: path.join(dataDir, `s3-${s3Port}`),
  bucket: env.S3_BUCKET,
});
const payments = await startPaymentsFake({
  port: paymentsPort,
  dir: path.join(dataDir, `payments-${paymentsPort}`),
  webhookUrl: new URL("/api/payments/webhook", env.APP_URL).toString(),
  webhookSecret: env.STRIPE_WEBHOOK_SECRET ?? "",
});
console.log(
  `[services] smtp 127.0.0.1:${smtp.smtpPort} · mailbox http://127.0.0.1:${smtp.httpPort} · s3 http://127.0.0.1:${s3.port} · payments ${payments.url}`,
);

const parent = process.ppid;
let stopping = false;
async function stop(signal: string) {
  if (stopping) return;
  stopping = true;
  clearInterval(watchdog);
  await Promise.allSettled([smtp.close(), s3.close(), payments.close()]);
  console.log(`[services] stopped (${signal})`);
  process.exit(0);
}
// Parent watchdog: if whoever started us has gone, stop rather than linger as an orphan.
const watchdog = setInterval(() => {
  try {
    process.kill(parent, 0);
  } catch (error) {
    // Only "no such process" means it has gone: EPERM (a parent of another user, such as the
    // service manager) means it is there.
    if ((error as NodeJS.ErrnoException).code !== "ESRCH") return;
    void stop("parent gone");
  }
}, 2000);
process.on("SIGINT", () => void stop("SIGINT"));
process.on("SIGTERM", () => void stop("SIGTERM"));
