import { type ChildProcess, spawn } from "node:child_process";
import path from "node:path";

/** Start `next start` from the test build on 127.0.0.1 and wait until /api/health answers 200. */
export async function startAppServer(opts: { port: number; env: Record<string, string> }): Promise<{
  url: string;
  /** Stop the server: SIGTERM lets it finish; SIGKILL cuts it off mid-request. */
  stop: (signal?: NodeJS.Signals) => Promise<void>;
}> {
  const root = path.resolve(import.meta.dirname, "../..");
  const child: ChildProcess = spawn(
    path.join(root, "node_modules/.bin/next"),
    ["start", "-H", "127.0.0.1", "-p", String(opts.port)],
    {
      cwd: root,
      env: { ...process.env, ...opts.env, NODE_ENV: "production" },
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
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`next start exited early:\n${output}`);
    try {
      const r = await fetch(`${url}/api/health`);
      if (r.status === 200) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      child.kill("SIGTERM");
      throw new Error(`app did not become healthy within 60 s:\n${output}`);
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  return {
    url,
    stop: (signal = "SIGTERM") =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once("exit", () => resolve());
        child.kill(signal);
        setTimeout(() => child.kill("SIGKILL"), 5000).unref();
      }),
  };
}
