import { env } from "../env";

const seen = new Map<string, number>();

/**
 * A named place where the fault tests make this process die on the spot (SIGKILL: no cleanup, no
 * answer, as when a machine loses power). Only when `PLUMBLINE_FAULTS` names it, which lib/env.ts
 * refuses outside the demo; `name@3` dies the third time the place is reached. Elsewhere a no-op.
 */
export function faultPoint(name: string): void {
  if (env.PLUMBLINE_FAULTS === "") return;
  for (const spec of env.PLUMBLINE_FAULTS.split(",")) {
    const [wanted, nth = "1"] = spec.trim().split("@");
    if (wanted !== name) continue;
    const count = (seen.get(name) ?? 0) + 1;
    seen.set(name, count);
    if (count === Number(nth)) {
      console.error(`[fault] ${name}: killing process ${process.pid} as the test asked`);
      process.kill(process.pid, "SIGKILL");
    }
  }
}
