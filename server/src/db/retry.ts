/** A deadlock (1213) or lock-wait timeout (1205), also when the ORM keeps the driver's error as the cause. */
export const lockConflict = (err: unknown): boolean => {
  const e = err as { errno?: number; cause?: { errno?: number } } | null;
  const errno = e?.errno ?? e?.cause?.errno;
  return errno === 1213 || errno === 1205;
};

/**
 * Runs a transaction again on a deadlock (1213; on Galera also a certification conflict at commit) or lock-wait
 * timeout (1205), with a backoff that doubles from about 10 ms (jittered, at most 400 ms), up to 8 times.
 */
export async function withDeadlockRetry<T>(fn: () => Promise<T>, attempts = 8): Promise<T> {
  for (let i = 1; ; i++) {
    try {
      return await fn();
    } catch (err) {
      if (i >= attempts || !lockConflict(err)) throw err;
      await new Promise((r) => setTimeout(r, Math.min(400, 5 + Math.random() * 10 * 2 ** i)));
    }
  }
}

/** mysql2's result header for an UPDATE, as Drizzle hands it back. */
export const affectedRows = (result: unknown): number => {
  const header = Array.isArray(result) ? result[0] : result;
  return (header as { affectedRows?: number }).affectedRows ?? 0;
};

export const isDuplicate = (err: unknown): boolean => {
  const e = err as { code?: string; cause?: { code?: string } };
  return e.code === 'ER_DUP_ENTRY' || e.cause?.code === 'ER_DUP_ENTRY';
};
