import { isRetryableLockError } from "./retryable-lock-error";

// Network-level codes (Node) and MariaDB error numbers that mean "the database is not there right
// now" rather than "this request is wrong": refused or dropped connections, a server shutting
// down (1053 ER_SERVER_SHUTDOWN), too many connections (1040 ER_CON_COUNT_ERROR), the connection
// killed (1927 ER_CONNECTION_KILLED). Source: MariaDB error codes and mysql2's PROTOCOL_* codes
// (from memory).
const CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "EPIPE",
  "ETIMEDOUT",
  "PROTOCOL_CONNECTION_LOST",
  "PROTOCOL_SEQUENCE_TIMEOUT",
  "ER_SERVER_SHUTDOWN",
  "ER_CON_COUNT_ERROR",
  "ER_CONNECTION_KILLED",
]);
const ERRNOS = new Set([1053, 1040, 1927, 2002, 2003, 2006, 2013]);

/**
 * Whether an error (or what caused it) says the database is away or busy for a moment — answered
 * 503 with Retry-After so a phone's outbox tries again — including a lock conflict that was still
 * there after the transaction's own retries.
 */
export function isDatabaseUnavailable(error: unknown): boolean {
  for (
    let e = error as { code?: unknown; errno?: unknown; cause?: unknown; fatal?: unknown } | null,
      depth = 0;
    e && depth < 5;
    depth += 1
  ) {
    // mysql2 marks a lost or refused connection `fatal`; the same codes from S3 or SMTP are not
    // the database's and stay a 500.
    if (typeof e.code === "string" && CODES.has(e.code) && e.fatal === true) return true;
    if (typeof e.errno === "number" && ERRNOS.has(e.errno)) return true;
    if (isRetryableLockError(e)) return true;
    e = (e.cause ?? null) as typeof e;
  }
  return false;
}
