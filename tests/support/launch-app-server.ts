import { type ChildProcess, spawn } from "node:child_process";
import path from "node:path";

export type LaunchedServer = {
  url: string;
  /** The `next start` process's id (the bench reads its CPU time from /proc). */
  pid: number | undefined;
  /** Resolves "healthy" once /api/health answers 200, or "exited" if the process ends first. */
  outcome: Promise<"healthy" | "exited">;
  exitCode: () => number | null;
  output: () => string;
  /** Stop the server: SIGTERM lets it finish; SIGKILL cuts it off mid-request. */
  stop: (signal?: NodeJS.Signals) => Promise<void>;
};

/**
 * Start `next start` of the test build with exactly `env` (plus PATH and HOME, nothing else
 * inherited), to see what a deployment with that environment does. Bounded: gives up after
 * 60 s. The caller stops it.
 */
export function launchAppServer(opts: {
  port: number;
  env: Record<string, string>;
  /** Also pass on this process's environment (the test services' settings), under `env`. */
  inherit?: boolean;
}): LaunchedServer {
  const root = path.resolve(import.meta.dirname, "../..");
  const child: ChildProcess = spawn(
    path.join(root, "node_modules/.bin/next"),
    ["start", "-H", "127.0.0.1", "-p", String(opts.port)],
    {
      cwd: root,
      env: {
        ...(opts.inherit ? process.env : {}),
        PATH: process.env.PATH ?? "",
        HOME: process.env.HOME ?? "",
        NEXT_TELEMETRY_DISABLED: "1",
        TZ: "UTC",
        ...opts.env,
        NODE_ENV: "production",
      },
      stdio: ["ignore", "pipe", "pipe"],
    },
  );
  let output = "";
  child.stdout?.on("data", (d: Buffer) => {
    output += d.toString();
  });
  child.stderr?.on("data", (d: Buffer) => {
    output += d.toString();
  });
  const url = `http://127.0.0.1:${opts.port}`;
  const exited = new Promise<"exited">((resolve) => child.once("exit", () => resolve("exited")));
  const healthy = (async (): Promise<"healthy" | "exited"> => {
    const deadline = Date.now() + 60_000;
    while (Date.now() < deadline && child.exitCode === null) {
      try {
        if ((await fetch(`${url}/api/health`)).status === 200) return "healthy";
      } catch {
        // not listening yet
      }
      await new Promise((r) => setTimeout(r, 250));
    }
    return "exited";
  })();
  return {
    url,
    pid: child.pid,
    outcome: Promise.race([healthy, exited]),
    exitCode: () => child.exitCode,
    output: () => output,
    stop: (signal = "SIGTERM") =>
      new Promise<void>((resolve) => {
        // Ended already (by itself, or killed by a signal: then exitCode stays null).
        if (child.exitCode !== null || child.signalCode !== null) return resolve();
        child.once("exit", () => resolve());
        child.kill(signal);
        setTimeout(() => child.kill("SIGKILL"), 5000).unref();
      }),
  };
}
