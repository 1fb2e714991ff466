// Vitest global setup for *.integration.test.ts: a fresh MariaDB database with migrations and the
// demo data, the local mail and storage fakes, and the built app (`next start`) on test ports.
import path from "node:path";
import type { TestProject } from "vitest/node";
import { startS3Fake } from "../../scripts/fakes/s3-fake";
import { startSmtpFake } from "../../scripts/fakes/smtp-fake";
import { prepareDatabase } from "./prepare-database";
import { startAppServer } from "./start-app-server";
import { createTestDatabase } from "./test-database";
import { testPorts, testServiceEnv } from "./test-env";

declare module "vitest" {
  export interface ProvidedContext {
    appUrl: string;
    databaseUrl: string;
    mailboxUrl: string;
  }
}

export default async function setup(project: TestProject) {
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
  const app = await startAppServer({ port: testPorts.app, env });
  project.provide("appUrl", app.url);
  project.provide("databaseUrl", database.url);
  project.provide("mailboxUrl", env.MAILBOX_URL ?? "");
  return async () => {
    await app.stop();
    await Promise.allSettled([smtp.close(), s3.close()]);
    await database.drop();
  };
}
