// The job worker (lib/jobs): re-derives verdicts after syncs and sends e-mail, off the request
// path. `npm start`, the tests and the bench start it beside the app with the same environment;
// a live deployment runs it as its own service (`npm run worker`). Stops on SIGINT/SIGTERM after
// the jobs in hand, and by itself when the process that started it is gone.
import { closeDb } from "../db/client";
import { env } from "../lib/env";
import { workQueue } from "../lib/jobs/work-queue";
import { closeMailTransport } from "../lib/mail/mail-transport";

const parent = process.ppid;
let stop: () => void = () => undefined;
const stopped = new Promise<void>((resolve) => {
  stop = resolve;
});
process.on("SIGINT", () => stop());
process.on("SIGTERM", () => stop());
const watchdog = setInterval(() => {
  try {
    process.kill(parent, 0);
  } catch (error) {
    // Only "no such process" means it has gone: EPERM (a parent of another user, such as the
    // service manager) means it is there.
    if ((error as NodeJS.ErrnoException).code !== "ESRCH") return;
    stop();
  }
}, 2000);

console.log(
  `[worker] ready: polling every ${env.PLUMBLINE_WORKER_POLL_MS} ms, lease ${env.PLUMBLINE_JOB_LEASE_MS} ms (pid ${process.pid})`,
);
await workQueue({
  leaseMs: env.PLUMBLINE_JOB_LEASE_MS,
  pollMs: env.PLUMBLINE_WORKER_POLL_MS,
  stopped,
});
clearInterval(watchdog);
closeMailTransport();
await closeDb();
console.log("[worker] stopped");
