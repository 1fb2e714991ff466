import "server-only";
import { getDb } from "./client";
import { isRetryableLockError } from "./retryable-lock-error";

/** The transaction handle Drizzle passes to a transaction's body. */
export type Tx = Parameters<Parameters<ReturnType<typeof getDb>["transaction"]>[0]>[0];

const MAX_ATTEMPTS = 6;

/**
 * Run `body` in one transaction and, when InnoDB rolls it back for a deadlock or a lock wait
 * timeout, run it again from the start (a few times, with a short random pause) instead of
 * failing the request. The body must therefore do nothing outside the database that it would
 * mind doing twice. READ COMMITTED by default: reads take no gap locks, which is what let two
 * phones' batches deadlock on ids neither had stored yet.
 */
export async function runTransaction<T>(
  body: (tx: Tx) => Promise<T>,
  {
    isolationLevel = "read committed",
  }: { isolationLevel?: "read committed" | "repeatable read" } = {},
): Promise<T> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await getDb().transaction(body, { isolationLevel });
    } catch (error) {
      if (!isRetryableLockError(error) || attempt >= MAX_ATTEMPTS) throw error;
      const pauseMs = 5 * 2 ** attempt * (0.5 + Math.random());
      console.warn(
        `[db] transaction rolled back (${(error as { code?: string }).code ?? "lock"}), attempt ${attempt} of ${MAX_ATTEMPTS}; again in ${Math.round(pauseMs)} ms`,
      );
      await new Promise((resolve) => setTimeout(resolve, pauseMs));
    }
  }
}
