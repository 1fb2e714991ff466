// npm run bench: start what the figures need on 127.0.0.1, measure each figure beside its floor
// (3 times; once with --tiny), print min / median / max, write results.json and results.md, and
// stop everything it started. See README, "Benchmarks".
import { mkdir, writeFile } from "node:fs/promises";
import path from "node:path";
import { createPool } from "../../db/client";
import { demo } from "../../tests/support/demo-accounts";
import { HttpSession } from "../../tests/support/http-session";
import { benchEventSize } from "./bench-event-size";
import { type BenchMeta, loadAverage, startMeta } from "./bench-meta";
import { type BenchOptions, parseBenchOptions } from "./bench-options";
import { benchPhoneBurst, type Official } from "./bench-phone-burst";
import { benchReevaluation } from "./bench-reevaluation";
import { benchSyncAcceptance } from "./bench-sync-acceptance";
import { CleanupList } from "./cleanup-list";
import { copyDemoEntries, removeCopies } from "./copy-demo-entries";
import type { Figure } from "./figure";
import { formatMarkdown, formatTable } from "./format-results";
import { postPhoneBatch } from "./post-phone-batch";
import { findMariadbPid } from "./process-cpu-seconds";
import { type BenchStack, startBenchStack } from "./start-bench-stack";
import { waitForVerdict } from "./wait-for-verdict";

const root = path.resolve(import.meta.dirname, "../..");
const log = (line: string) => console.log(`[bench] ${line}`);

async function signIn(appUrl: string, email: string): Promise<HttpSession> {
  const session = new HttpSession(appUrl);
  const response = await session.signInWithPassword(email, demo.password);
  if (response.status >= 400 || !session.hasCookie("authjs.session-token"))
    throw new Error(`could not sign in as ${email} (HTTP ${response.status})`);
  return session;
}

async function main(): Promise<void> {
  const options = parseBenchOptions(process.argv.slice(2), process.env);
  // The bench seeds the demo (its accounts share the published password) into its own database.
  process.env.PLUMBLINE_MODE = "demo";
  const meta = startMeta({ tiny: options.tiny, sizes: options.sizes, cwd: root });
  log(`${options.tiny ? "tiny run" : "full run"}; app on 127.0.0.1:${options.ports.app}`);
  const cleanup = new CleanupList();
  const stopOnSignal = (signal: NodeJS.Signals) => {
    log(`${signal}: stopping what the bench started`);
    void cleanup.run().finally(() => process.exit(130));
  };
  process.once("SIGINT", stopOnSignal);
  process.once("SIGTERM", stopOnSignal);
  try {
    await runFigures(options, meta, cleanup);
  } finally {
    await cleanup.run();
  }
}

async function runFigures(
  options: BenchOptions,
  meta: BenchMeta,
  cleanup: CleanupList,
): Promise<void> {
  const stack = await startBenchStack(options, cleanup);
  // Keep the server's output for the record, whatever happens next (runs before they stop).
  cleanup.add(() => keepServerLog(stack));
  const pool = createPool(stack.database.url, Math.max(4, options.sizes.syncConcurrency));
  cleanup.add(() => pool.end());
  const { seed } = stack.database;
  const eventId = seed.eventId;
  meta.worker = stack.workerPid
    ? "scripts/worker.ts, started beside the app"
    : `none (${stack.noWorkerReason})`;
  log(`stack up: database ${stack.database.name}, worker: ${meta.worker}`);
  const officials: Official[] = [
    {
      session: await signIn(stack.appUrl, demo.scrutineer),
      officialId: seed.userIds.scrutineer ?? "",
    },
    {
      session: await signIn(stack.appUrl, demo.scrutineer2),
      officialId: seed.userIds.scrutineer2 ?? "",
    },
  ];
  const [first, second] = officials;
  if (!first || !second) throw new Error("no officials");
  const entrants = new Map<string, Promise<HttpSession>>();
  const appUrl = stack.appUrl;
  const entrantSession = (email: string) => {
    let session = entrants.get(email);
    if (!session) {
      session = signIn(appUrl, email);
      entrants.set(email, session);
    }
    return session;
  };

  // Warm up: the first request to each route loads its code.
  const [warmCar] = await copyDemoEntries(pool, eventId, 1);
  if (!warmCar) throw new Error("no car to warm up with");
  for (let i = 0; i < 3; i += 1) {
    const answer = await postPhoneBatch(eventId, {
      ...first,
      deviceId: "bench-warm-up",
      entryIds: [warmCar.entryId],
    });
    if (!answer.ok) throw new Error(`warm-up sync failed: ${answer.problem}`);
    if (i === 2 && answer.receivedAt !== null)
      await waitForVerdict({
        session: await entrantSession(warmCar.driverEmail),
        entryId: warmCar.entryId,
        receivedAt: answer.receivedAt,
        answeredAt: answer.answeredAt,
      });
  }
  await removeCopies(stack.database.url, [warmCar]);

  const figures: Figure[] = [];
  figures.push(
    await benchSyncAcceptance({
      appUrl,
      databaseUrl: stack.database.url,
      pool,
      eventId,
      session: first.session,
      officialId: first.officialId,
      sizes: options.sizes,
      workerPid: stack.workerPid,
      log,
    }),
  );
  figures.push(
    ...(await benchPhoneBurst({
      databaseUrl: stack.database.url,
      pool,
      eventId,
      officials,
      entrantSession,
      pids: {
        app: stack.appPid,
        worker: stack.workerPid,
        mariadb: findMariadbPid(options.ports.db),
      },
      cores: meta.cores,
      noWorkerReason: stack.noWorkerReason,
      sizes: options.sizes,
      log,
    })),
  );
  figures.push(await benchReevaluation({ sizes: options.sizes, log }));
  figures.push(
    ...(await benchEventSize({
      appUrl,
      pool,
      demoEventId: eventId,
      phone: first,
      otherPhone: second,
      sizes: options.sizes,
      log,
    })),
  );

  meta.finishedAt = new Date().toISOString();
  meta.loadAfter = loadAverage();
  await mkdir(options.outDir, { recursive: true });
  await writeFile(
    path.join(options.outDir, "results.json"),
    `${JSON.stringify({ meta, figures }, null, 2)}\n`,
  );
  await writeFile(path.join(options.outDir, "results.md"), formatMarkdown(meta, figures));
  console.log(`\n${formatTable(figures)}\n`);
  log(`load average ${meta.loadBefore} before, ${meta.loadAfter} after (${meta.cores} cores)`);
  log(`results in ${path.relative(root, options.outDir) || "."}/results.{json,md}`);
}

/** Write what the app and worker printed to .data/bench-logs/ and name the errors in it. */
async function keepServerLog(stack: BenchStack): Promise<void> {
  const logFile = path.join(root, ".data/bench-logs", `${stack.database.name}.log`);
  await mkdir(path.dirname(logFile), { recursive: true });
  const output = stack.serverOutput();
  await writeFile(logFile, output);
  // Name what went wrong on the server (a deadlock, a timeout) without the SQL around it.
  const failures = output.match(/unexpected error/g)?.length ?? 0;
  const codes = [...new Set(output.match(/code: '[A-Z_]+'/g) ?? [])].join(", ");
  log(
    `server output in ${path.relative(root, logFile)}${failures > 0 ? `: ${failures} unexpected errors (${codes || "see the log"})` : ""}`,
  );
}

main().then(
  () => process.exit(0),
  (error: unknown) => {
    console.error("[bench] failed:", error);
    process.exit(1);
  },
);
