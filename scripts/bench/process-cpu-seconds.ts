// CPU time (user + system) of processes, from Linux's /proc/<pid>/stat: how much of the machine
// the app, the worker and MariaDB spent, to compute what a perfect server could reach.
import { execFileSync } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";

let ticksPerSecond: number | null = null;

function clockTicks(): number {
  if (ticksPerSecond === null) {
    try {
      ticksPerSecond = Number(execFileSync("getconf", ["CLK_TCK"]).toString().trim()) || 100;
    } catch {
      ticksPerSecond = 100;
    }
  }
  return ticksPerSecond;
}

type Stat = { pid: number; ppid: number; ticks: number };

function readStat(pid: number): Stat | null {
  try {
    const text = readFileSync(`/proc/${pid}/stat`, "utf8");
    // The command name may hold spaces and brackets: the fields start after the last ")".
    const fields = text.slice(text.lastIndexOf(")") + 2).split(" ");
    // After the name: state(3) ppid(4) … utime(14) stime(15), counted from 1 with pid and name.
    const ppid = Number(fields[1]);
    const utime = Number(fields[11]);
    const stime = Number(fields[12]);
    return { pid, ppid, ticks: utime + stime };
  } catch {
    return null; // gone, or not ours to read
  }
}

function allStats(): Stat[] {
  return readdirSync("/proc")
    .filter((name) => /^\d+$/.test(name))
    .map((name) => readStat(Number(name)))
    .filter((s): s is Stat => s !== null);
}

/** CPU seconds spent so far by each root process and everything it started (still running). */
export function processTreeCpuSeconds(rootPid: number): number {
  const stats = allStats();
  const children = new Map<number, Stat[]>();
  for (const s of stats) children.set(s.ppid, [...(children.get(s.ppid) ?? []), s]);
  const root = stats.find((s) => s.pid === rootPid);
  if (!root) return 0;
  let ticks = 0;
  const queue: Stat[] = [root];
  for (let i = 0; i < queue.length && i < 10_000; i += 1) {
    const s = queue[i];
    if (s === undefined) break;
    ticks += s.ticks;
    queue.push(...(children.get(s.pid) ?? []));
  }
  return ticks / clockTicks();
}

/** The MariaDB server listening on `port` (by its command line), or null when none is visible. */
export function findMariadbPid(port: number): number | null {
  for (const name of readdirSync("/proc")) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const args = readFileSync(`/proc/${name}/cmdline`, "utf8").split("\0");
      if (/(mariadbd|mysqld)$/.test(args[0] ?? "") && args.includes(`--port=${port}`))
        return Number(name);
    } catch {
      // gone, or not ours to read
    }
  }
  return null;
}
