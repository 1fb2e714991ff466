import { type ChildProcess, spawn } from "node:child_process";

export type ReadyProcess = {
  pid: number;
  output: () => string;
  /** SIGTERM, then SIGKILL after 5 s; resolves once the process has exited. */
  stop: () => Promise<void>;
};

/**
 * Start a helper process (the service fakes, the worker) with exactly `env`, and wait until it
 * prints `ready` on stdout. Bounded: gives up after `timeoutMs`, or as soon as it exits, and then
 * kills it and throws with what it printed.
 */
export async function spawnReadyProcess(opts: {
  command: string;
  args: string[];
  cwd: string;
  env: Record<string, string>;
  ready: RegExp;
  timeoutMs: number;
  name: string;
}): Promise<ReadyProcess> {
  const child: ChildProcess = spawn(opts.command, opts.args, {
    cwd: opts.cwd,
    // Exactly this environment (Next's types ask for NODE_ENV, which the helpers leave unset).
    env: opts.env as NodeJS.ProcessEnv,
    stdio: ["ignore", "pipe", "pipe"],
  });
  let output = "";
  let stdout = "";
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  const ready = new Promise<boolean>((resolve) => {
    const timer = setTimeout(() => resolve(false), opts.timeoutMs);
    child.stdout?.on("data", (d: Buffer) => {
      output += d.toString();
      stdout += d.toString();
      if (opts.ready.test(stdout)) {
        clearTimeout(timer);
        resolve(true);
      }
    });
    child.once("exit", () => {
      clearTimeout(timer);
      resolve(false);
    });
  });
  child.stderr?.on("data", (d: Buffer) => {
    output += d.toString();
  });
  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null) return;
    const killer = setTimeout(() => child.kill("SIGKILL"), 5000);
    child.kill("SIGTERM");
    await exited;
    clearTimeout(killer);
  };
  if (!(await ready) || child.pid === undefined) {
    await stop();
    throw new Error(`${opts.name} did not become ready within ${opts.timeoutMs} ms:\n${output}`);
  }
  return { pid: child.pid, output: () => output, stop };
}
