// MariaDB error numbers a transaction may meet through no fault of its own: a deadlock (InnoDB
// rolled this transaction back to let another go on) or a lock wait that ran out. Source:
// MariaDB Server error codes, 1213 ER_LOCK_DEADLOCK and 1205 ER_LOCK_WAIT_TIMEOUT (from memory).
const RETRYABLE = new Set([1213, 1205]);

/** Whether InnoDB gave up this transaction for a deadlock or a lock wait (it may be run again). */
export function isRetryableLockError(error: unknown): boolean {
  const errno = (error as { errno?: unknown; cause?: { errno?: unknown } } | null)?.errno;
  const causeErrno = (error as { cause?: { errno?: unknown } } | null)?.cause?.errno;
  return RETRYABLE.has(Number(errno)) || RETRYABLE.has(Number(causeErrno));
}
