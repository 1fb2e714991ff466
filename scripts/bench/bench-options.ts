// What `npm run bench` runs and where: sizes for the full run and for `--tiny`, the ports of the
// servers it starts on 127.0.0.1, and where it writes its results.
import path from "node:path";

/** Records in one sync batch: what a phone's outbox sends (lib/offline/drain-outbox.ts). */
export const BATCH_SIZE = 50;

export type BenchSizes = {
  /** Each figure and its floor are measured this many times; min / median / max over them. */
  repetitions: number;
  /** P2: sync batches per repetition, and the raw INSERT batches of its floor. */
  syncBatches: number;
  /** P2: requests (and INSERTs) in flight at once, for both the figure and its floor. */
  syncConcurrency: number;
  /** P6: phones posting one batch each at the same moment. */
  phones: number;
  /** P6: sequential single-phone requests that give the floor's p50 and CPU per request. */
  singlePhoneRequests: number;
  /** P3: entries re-evaluated (25 records each). */
  engineEntries: number;
  /** P7: entries in the large event, and records each. */
  largeEventEntries: number;
  largeEventRecordsPerEntry: number;
  /** P7a: sequential batches timed in each event per repetition. */
  eventSyncBatches: number;
};

export const fullSizes: BenchSizes = {
  repetitions: 3,
  syncBatches: 120,
  syncConcurrency: 4,
  phones: 40,
  singlePhoneRequests: 20,
  engineEntries: 1000,
  largeEventEntries: 300,
  largeEventRecordsPerEntry: 25,
  eventSyncBatches: 8,
};

/** `--tiny`: every figure once on a very small size, to prove the harness still works. */
export const tinySizes: BenchSizes = {
  repetitions: 1,
  syncBatches: 6,
  syncConcurrency: 2,
  phones: 4,
  singlePhoneRequests: 3,
  engineEntries: 40,
  largeEventEntries: 30,
  largeEventRecordsPerEntry: 25,
  eventSyncBatches: 2,
};

export type BenchPorts = {
  app: number;
  smtp: number;
  mailbox: number;
  s3: number;
  payments: number;
  db: number;
};

export type BenchOptions = {
  tiny: boolean;
  sizes: BenchSizes;
  ports: BenchPorts;
  /** Folder for results.json and results.md. */
  outDir: string;
};

const root = path.resolve(import.meta.dirname, "../..");

function portFrom(value: string | undefined, fallback: number, name: string): number {
  if (value === undefined || value === "") return fallback;
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1 || n > 65535)
    throw new Error(`${name} is not a port: ${value}`);
  return n;
}

/**
 * Read the command line (`--tiny`, `--out <dir>`) and the environment (`PLUMBLINE_BENCH_TINY=1`,
 * `PLUMBLINE_BENCH_APP_PORT`, `_SMTP_PORT`, `_MAILBOX_PORT`, `_S3_PORT`, `_PAYMENTS_PORT`, `PLUMBLINE_DB_PORT`).
 * The full run writes to bench/, a tiny one to .data/bench-tiny/ unless told otherwise.
 */
export function parseBenchOptions(
  argv: readonly string[],
  source: Record<string, string | undefined>,
): BenchOptions {
  const tiny = argv.includes("--tiny") || source.PLUMBLINE_BENCH_TINY === "1";
  const outAt = argv.indexOf("--out");
  const outArg = outAt >= 0 ? argv[outAt + 1] : undefined;
  if (outAt >= 0 && (outArg === undefined || outArg.startsWith("--")))
    throw new Error("--out needs a folder");
  const unknown = argv.filter(
    (a, i) => a.startsWith("--") && a !== "--tiny" && a !== "--out" && argv[i - 1] !== "--out",
  );
  if (unknown.length > 0) throw new Error(`unknown option ${unknown.join(" ")}`);
  return {
    tiny,
    sizes: tiny ? tinySizes : fullSizes,
    ports: {
      app: portFrom(source.PLUMBLINE_BENCH_APP_PORT, 3400, "PLUMBLINE_BENCH_APP_PORT"),
      smtp: portFrom(source.PLUMBLINE_BENCH_SMTP_PORT, 2825, "PLUMBLINE_BENCH_SMTP_PORT"),
      mailbox: portFrom(source.PLUMBLINE_BENCH_MAILBOX_PORT, 2880, "PLUMBLINE_BENCH_MAILBOX_PORT"),
      s3: portFrom(source.PLUMBLINE_BENCH_S3_PORT, 4868, "PLUMBLINE_BENCH_S3_PORT"),
      payments: portFrom(
        source.PLUMBLINE_BENCH_PAYMENTS_PORT,
        4870,
        "PLUMBLINE_BENCH_PAYMENTS_PORT",
      ),
      db: portFrom(source.PLUMBLINE_DB_PORT, 3307, "PLUMBLINE_DB_PORT"),
    },
    outDir: path.resolve(root, outArg ?? (tiny ? ".data/bench-tiny" : "bench")),
  };
}
