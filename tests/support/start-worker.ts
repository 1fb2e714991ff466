import { type ChildProcess, spawn } from "node:child_process";
import path from "node:path";

export type StartedWorker = {
  pid: number;
  output: () => string;
  /** Resolves with the exit signal or code when the worker ends (killed by a fault point, say). */
  exited: Promise<NodeJS.Signals | number | null>;
  /** SIGTERM lets it finish the jobs in hand; SIGKILL cuts it off. */
  stop: (signal?: NodeJS.Signals) => Promise<void>;
};

/**
 * Start the job worker (scripts/worker.ts) with this process's environment plus `env`, and wait
 * (bounded, 30 s) until it says it is ready.
 */
export async function startWorker(env: Record<string, string> = {}): Promise<StartedWorker> {
  const root = path.resolve(import.meta.dirname, "../..");
  const child: ChildProcess = spawn(
    path.join(root, "node_modules/.bin/tsx"),
    ["--conditions=react-server", "scripts/worker.ts"],
    {
      cwd: root,
      env: { ...process.env, TZ: "UTC", ...env },
      stdio: ["ignore", "pipe", "pipe"],
    },
  );
  let output = "";
  let onReady: () => void = () => undefined;
  const ready = new Promise<void>((resolve) => {
    onReady = resolve;
  });
  const collect = (d: Buffer) => {
    output += d.toString();
    if (output.includes("[worker] ready")) onReady();
  };
  child.stdout?.on("data", collect);
  child.stderr?.on("data", collect);
  const exited = new Promise<NodeJS.Signals | number | null>((resolve) =>
    child.once("exit", (code, signal) => resolve(signal ?? code)),
  );
  const timeout = new Promise<"timeout">((resolve) =>
    setTimeout(() => resolve("timeout"), 30_000).unref(),
  );
  const outcome = await Promise.race([ready.then(() => "ready" as const), exited, timeout]);
  if (outcome !== "ready") {
    child.kill("SIGKILL");
    throw new Error(`worker did not start (${String(outcome)}):\n${output}`);
  }
  return {
    pid: child.pid ?? 0,
    output: () => output,
    exited,
    stop: (signal = "SIGTERM") =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null || child.signalCode !== null) return resolve();
        child.once("exit", () => resolve());
        child.kill(signal);
        setTimeout(() => child.kill("SIGKILL"), 10_000).unref();
      }),
  };
}
