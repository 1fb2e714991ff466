// What a bench run records about itself: when, where, on which commit, at what load.
import { execFileSync } from "node:child_process";
import os from "node:os";
import { BATCH_SIZE, type BenchSizes } from "./bench-options";

export type BenchMeta = {
  startedAt: string;
  finishedAt: string;
  tiny: boolean;
  commit: string;
  node: string;
  cores: number;
  cpuModel: string;
  /** 1-, 5- and 15-minute load averages: other work on the machine moves every figure. */
  loadBefore: string;
  loadAfter: string;
  worker: string;
  batchSize: number;
  sizes: BenchSizes;
};

export function loadAverage(): string {
  return os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(" / ");
}

function gitCommit(cwd: string): string {
  try {
    const sha = execFileSync("git", ["rev-parse", "--short", "HEAD"], { cwd }).toString().trim();
    const dirty = execFileSync("git", ["status", "--porcelain"], { cwd }).toString().trim() !== "";
    return dirty ? `${sha} with uncommitted changes` : sha;
  } catch {
    return "unknown";
  }
}

export function startMeta(opts: { tiny: boolean; sizes: BenchSizes; cwd: string }): BenchMeta {
  return {
    startedAt: new Date().toISOString(),
    finishedAt: "",
    tiny: opts.tiny,
    commit: gitCommit(opts.cwd),
    node: process.versions.node,
    cores: os.availableParallelism(),
    cpuModel: os.cpus()[0]?.model ?? "unknown",
    loadBefore: loadAverage(),
    loadAfter: "",
    worker: "",
    batchSize: BATCH_SIZE,
    sizes: opts.sizes,
  };
}
