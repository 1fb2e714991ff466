// `npm run bench -- --tiny` still runs: every figure comes out as a finite number (times are not
// judged here: they depend on the machine), and no sync request of the burst failed.
import { execFile } from "node:child_process";
import { existsSync } from "node:fs";
import { mkdtemp, readFile, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";

const root = path.resolve(import.meta.dirname, "../..");
const FIGURES = [
  "P2",
  "P6",
  "P6 floor",
  "P6 errors",
  "P2b",
  "P3",
  "P7a",
  "P7b full",
  "P7b full gz",
  "P7b partial",
  "P7b partial gz",
];

type Result = {
  meta: { sizes: { repetitions: number } };
  figures: {
    id: string;
    notMeasured: string | null;
    spread: { min: number; median: number; max: number } | null;
    runs: { value: number | null }[];
  }[];
};

let outDir = "";

afterAll(async () => {
  if (outDir) await rm(outDir, { recursive: true, force: true });
});

describe("npm run bench -- --tiny", () => {
  it("produces every figure as a finite number, with no failed sync request", async () => {
    outDir = await mkdtemp(path.join(tmpdir(), "plumbline-bench-"));
    const run = await new Promise<{ code: number | null; output: string }>((resolve) => {
      // Bounded: the bench is killed (and stops what it started, on SIGTERM) after 170 s.
      execFile(
        path.join(root, "node_modules/.bin/tsx"),
        ["scripts/bench/run-bench.ts", "--tiny", "--out", outDir],
        { cwd: root, env: process.env, timeout: 170_000, maxBuffer: 16 * 1024 * 1024 },
        (error, stdout, stderr) =>
          resolve({
            code: error ? ((error as { code?: number }).code ?? 1) : 0,
            output: `${stdout}\n${stderr}`,
          }),
      );
    });
    expect(run.code, run.output).toBe(0);
    const result = JSON.parse(await readFile(path.join(outDir, "results.json"), "utf8")) as Result;
    expect(result.figures.map((f) => f.id)).toEqual(FIGURES);
    for (const figure of result.figures) {
      if (figure.id === "P2b" && !existsSync(path.join(root, "scripts/worker.ts"))) {
        // Without a worker a queued verdict is never computed: the bench says so instead.
        if (figure.notMeasured !== null) expect(figure.notMeasured).toMatch(/worker/);
        continue;
      }
      expect(figure.notMeasured, figure.id).toBeNull();
      expect(figure.runs, figure.id).toHaveLength(result.meta.sizes.repetitions);
      for (const value of [figure.spread?.min, figure.spread?.median, figure.spread?.max])
        expect(Number.isFinite(value), `${figure.id}: ${value}`).toBe(true);
    }
    // Source: common practice (no source) — a server under load may answer more slowly, but a
    // valid batch is never refused or lost for it: the burst's error count must be 0.
    const errors = result.figures.find((f) => f.id === "P6 errors");
    expect(errors?.spread?.max, run.output).toBe(0);
  }, 180_000);
});
