import { spawn } from "node:child_process";
import { once } from "node:events";
import type { Readable, Transform, Writable } from "node:stream";
import { pipeline } from "node:stream/promises";

/**
 * Run one of Debian's MariaDB clients (`mariadb-dump`, `mariadb`) with a chain of `input`
 * streams (a source, then transforms) piped to its standard input and its standard output piped
 * through the `output` chain (transforms, then a destination), and wait until both the pipes
 * and the process are done. Throws in words when the client is missing or exits non-zero, with what
 * it wrote to standard error. The child does not get DATABASE_URL: credentials reach it only
 * through the option file named in `args`.
 */
export async function runClient(opts: {
  command: string;
  args: string[];
  input?: [Readable, ...Transform[]];
  output?: [...Transform[], Writable];
}): Promise<void> {
  const { DATABASE_URL: _url, MYSQL_PWD: _pwd, ...env } = process.env;
  const child = spawn(opts.command, opts.args, {
    env,
    stdio: [opts.input ? "pipe" : "ignore", opts.output ? "pipe" : "ignore", "pipe"],
  });
  let stderr = "";
  child.stderr?.setEncoding("utf8");
  child.stderr?.on("data", (chunk: string) => {
    stderr = (stderr + chunk).slice(-4000);
  });
  const exited = once(child, "close") as Promise<[number | null, NodeJS.Signals | null]>;
  // Settled from the start, so a pipe that fails before the process ends is never unhandled.
  const piped = Promise.allSettled([
    opts.input && child.stdin ? pipeline([...opts.input, child.stdin]) : undefined,
    opts.output && child.stdout ? pipeline([child.stdout, ...opts.output]) : undefined,
  ]);
  let code: number | null;
  let signal: NodeJS.Signals | null;
  try {
    [code, signal] = await exited;
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") {
      throw new Error(
        `${opts.command} is not installed: install Debian's client with \`sudo apt-get install mariadb-client\``,
      );
    }
    throw error;
  }
  const pipes = await piped;
  if (code !== 0) {
    const why = signal ? `was stopped by ${signal}` : `exited with code ${code}`;
    throw new Error(`${opts.command} ${why}${stderr.trim() ? `:\n${stderr.trim()}` : ""}`);
  }
  for (const result of pipes) {
    if (result.status === "rejected") throw result.reason;
  }
}
