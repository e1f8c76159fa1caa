/** Runs a transaction again on a deadlock (1213) or lock-wait timeout (1205), with jitter, a few times. */
export async function withDeadlockRetry<T>(fn: () => Promise<T>, attempts = 5): Promise<T> {
  for (let i = 1; ; i++) {
    try {
      return await fn();
    } catch (err) {
      const e = err as { errno?: number; cause?: { errno?: number } };
      const errno = e.errno ?? e.cause?.errno;
      if (i >= attempts || (errno !== 1213 && errno !== 1205)) throw err;
      await new Promise((r) => setTimeout(r, 5 + Math.random() * 20 * i));
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
