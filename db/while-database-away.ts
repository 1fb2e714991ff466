import { isDatabaseUnavailable } from "./database-unavailable";

/**
 * Run `write` and, while the database is away (restarting, unreachable), run it again with a
 * growing pause, for up to `forMs`. For a write that must follow something already done outside
 * the database — the line that says an e-mail went — so that a database restart does not make
 * the job forget it and send the e-mail again.
 */
export async function whileDatabaseAway<T>(
  write: () => Promise<T>,
  { forMs = 120_000 }: { forMs?: number } = {},
): Promise<T> {
  const deadline = Date.now() + forMs;
  for (let pause = 250; ; pause = Math.min(pause * 2, 5000)) {
    try {
      return await write();
    } catch (error) {
      if (!isDatabaseUnavailable(error) || Date.now() + pause > deadline) throw error;
      await new Promise((resolve) => setTimeout(resolve, pause));
    }
  }
}
