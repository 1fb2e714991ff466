import { queryTestDb } from "./query-test-db";

/**
 * Wait (bounded, 30 s) until the worker has finished every job in the test database: verdicts
 * re-derived, e-mails sent. Fails loudly with what is still open.
 */
export async function waitForQueueIdle(databaseUrl: string): Promise<void> {
  const deadline = Date.now() + 30_000;
  while (true) {
    const open = await queryTestDb<{ kind: string; status: string }>(
      databaseUrl,
      "select kind, status from jobs where status in ('queued', 'running')",
    );
    if (open.length === 0) return;
    if (Date.now() > deadline) {
      throw new Error(`jobs still open after 30 s: ${JSON.stringify(open.slice(0, 5))}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}
