// Vitest global setup for *.integration.test.ts: a fresh MariaDB database with migrations and the
// demo data, the local mail, storage and payments fakes, the built app (`next start`) on test ports and the
// job worker beside it.
import path from "node:path";
import type { TestProject } from "vitest/node";
import { DEMO_STRIPE_WEBHOOK_SECRET } from "../../lib/env";
import { startPaymentsFake } from "../../scripts/fakes/payments-fake";
import { startS3Fake } from "../../scripts/fakes/s3-fake";
import { startSmtpFake } from "../../scripts/fakes/smtp-fake";
import { prepareDatabase } from "./prepare-database";
import { startAppServer } from "./start-app-server";
import { startWorker } from "./start-worker";
import { createTestDatabase } from "./test-database";
import { testPorts, testServiceEnv } from "./test-env";

declare module "vitest" {
  export interface ProvidedContext {
    appUrl: string;
    databaseUrl: string;
    mailboxUrl: string;
    paymentsUrl: string;
  }
}

export default async function setup(project: TestProject) {
  // One fake clock (if any) for the test process, the app and the worker alike.
  if (process.env.PLUMBLINE_FAKE_NOW) process.env.PLUMBLINE_FAKE_NOW_SINCE ??= String(Date.now());
  const database = await createTestDatabase("int");
  const env = testServiceEnv(database.url);
  Object.assign(process.env, env);
  await prepareDatabase(database.url);
  const dir = path.resolve(import.meta.dirname, "../../.data/test-services", database.name);
  const smtp = await startSmtpFake({
    smtpPort: testPorts.smtp,
    httpPort: testPorts.mailbox,
    dir: `${dir}/mail`,
  });
  const s3 = await startS3Fake({
    port: testPorts.s3,
    dir: `${dir}/s3`,
    bucket: "plumbline-uploads",
  });
  const payments = await startPaymentsFake({
    port: testPorts.payments,
    webhookUrl: `${env.APP_URL}/api/payments/webhook`,
    webhookSecret: DEMO_STRIPE_WEBHOOK_SECRET,
  });
  const app = await startAppServer({ port: testPorts.app, env });
  // Fast polling and short leases: the tests wait for verdicts and take over a dead worker's jobs.
  const worker = await startWorker({
    ...env,
    PLUMBLINE_WORKER_POLL_MS: "50",
    PLUMBLINE_JOB_LEASE_MS: "3000",
  });
  project.provide("appUrl", app.url);
  project.provide("databaseUrl", database.url);
  project.provide("mailboxUrl", env.MAILBOX_URL ?? "");
  project.provide("paymentsUrl", payments.url);
  return async () => {
    await Promise.all([app.stop(), worker.stop()]);
    await Promise.allSettled([smtp.close(), s3.close(), payments.close()]);
    await database.drop();
  };
}
