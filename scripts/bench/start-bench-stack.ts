// Everything the bench measures, started on 127.0.0.1 and stopped again: its own database on the
// running MariaDB (migrated, demo seeded), the mail and S3 fakes (scripts/services.ts), `next
// start` of the test build, and the job worker when scripts/worker.ts exists.
import { existsSync } from "node:fs";
import { rm } from "node:fs/promises";
import path from "node:path";
import { launchAppServer } from "../../tests/support/launch-app-server";
import { assertPortFree } from "./assert-port-free";
import type { BenchOptions } from "./bench-options";
import type { CleanupList } from "./cleanup-list";
import { type BenchDatabase, prepareBenchDatabase } from "./prepare-bench-database";
import { type ReadyProcess, spawnReadyProcess } from "./spawn-ready-process";

export type BenchStack = {
  appUrl: string;
  database: BenchDatabase;
  /** Process ids whose CPU time the bench reads: the app, and the worker when it runs. */
  appPid: number;
  workerPid: number | null;
  /** Why there is no worker, when there is none. */
  noWorkerReason: string | null;
  /** What the app and the worker printed (their errors explain a failed request). */
  serverOutput: () => string;
};

const root = path.resolve(import.meta.dirname, "../..");
const workerScript = path.join(root, "scripts/worker.ts");

/**
 * Start the stack. Each part adds its stop to `cleanup` as soon as it runs, so the caller stops
 * whatever has started when a later step fails or a signal comes.
 */
export async function startBenchStack(
  options: BenchOptions,
  cleanup: CleanupList,
): Promise<BenchStack> {
  const { ports } = options;
  await assertPortFree(ports.app, "bench app");
  await assertPortFree(ports.smtp, "bench SMTP fake");
  await assertPortFree(ports.mailbox, "bench mailbox API");
  await assertPortFree(ports.s3, "bench S3 fake");
  await assertPortFree(ports.payments, "bench payments fake");
  const distDir = process.env.NEXT_DIST_DIR ?? ".next-test";
  if (!existsSync(path.join(root, distDir, "BUILD_ID")))
    throw new Error(
      `no build in ${distDir}: run \`NEXT_DIST_DIR=${distDir} node_modules/.bin/next build --webpack\` (npm run bench does)`,
    );

  const database = await prepareBenchDatabase();
  cleanup.add(database.drop);
  const servicesDir = path.join(root, ".data/bench-services", database.name);
  cleanup.add(() => rm(servicesDir, { recursive: true, force: true }));
  const env: Record<string, string> = {
    PATH: process.env.PATH ?? "",
    HOME: process.env.HOME ?? "",
    TZ: "UTC",
    NEXT_TELEMETRY_DISABLED: "1",
    DATABASE_URL: database.url,
    APP_URL: `http://127.0.0.1:${ports.app}`,
    SMTP_PORT: String(ports.smtp),
    MAILBOX_URL: `http://127.0.0.1:${ports.mailbox}`,
    S3_ENDPOINT: `http://127.0.0.1:${ports.s3}`,
    PAYMENTS_URL: `http://127.0.0.1:${ports.payments}`,
    NEXT_DIST_DIR: distDir,
    PLUMBLINE_MODE: "demo",
    // The bench signs in as many accounts from one address; it plays the one trusted proxy.
    TRUSTED_PROXY_HOPS: "1",
  };
  const services = await spawnReadyProcess({
    name: "service fakes",
    command: path.join(root, "node_modules/.bin/tsx"),
    args: ["scripts/services.ts"],
    cwd: root,
    env: { ...env, PLUMBLINE_SERVICES_DIR: servicesDir },
    ready: /\[services\] smtp/,
    timeoutMs: 30_000,
  });
  cleanup.add(services.stop);
  const app = launchAppServer({ port: ports.app, env });
  cleanup.add(() => app.stop());
  if ((await app.outcome) !== "healthy" || app.pid === undefined)
    throw new Error(`app did not become healthy within 60 s:\n${app.output()}`);
  let worker: ReadyProcess | null = null;
  if (existsSync(workerScript)) {
    worker = await spawnReadyProcess({
      name: "worker",
      // node itself with tsx as a loader (not the tsx launcher, which runs a second process), so
      // the pid is the worker's own and its CPU time can be read from /proc.
      command: process.execPath,
      args: ["--conditions=react-server", "--import", "tsx", "scripts/worker.ts"],
      cwd: root,
      env,
      ready: /\[worker\] ready/,
      timeoutMs: 60_000,
    });
    cleanup.add(worker.stop);
  }
  return {
    appUrl: app.url,
    database,
    appPid: app.pid,
    workerPid: worker?.pid ?? null,
    noWorkerReason: worker ? null : "scripts/worker.ts does not exist on this branch",
    serverOutput: () =>
      `--- next start\n${app.output()}${worker ? `\n--- worker\n${worker.output()}` : ""}`,
  };
}
