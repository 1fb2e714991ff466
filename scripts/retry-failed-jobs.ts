// npm run jobs:retry-failed — queue again every job the worker gave up on (e-mails that could not
// be sent for two hours, a recompute that kept failing), once the cause is mended.
import { closeDb } from "../db/client";
import { requeueFailedJobs } from "../db/queries/jobs/requeue-failed-jobs";

const count = await requeueFailedJobs();
console.log(`[jobs] ${count} given-up job(s) queued again; the worker takes them now`);
await closeDb();
