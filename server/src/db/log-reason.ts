/**
 * The innermost reason an error gave, as one log line: no stack, and not the ORM's wrapper, whose
 * message repeats the statement with its values (people's e-mail addresses among them).
 */
export function logReason(err: unknown): string {
  let reason = 'unknown';
  let e = err as { code?: unknown; message?: unknown; cause?: unknown } | null | undefined;
  for (let depth = 0; e && typeof e === 'object' && depth < 5; depth++, e = e.cause as typeof e) {
    if (typeof e.message === 'string') reason = e.message.split('\n')[0];
    if (typeof e.code === 'string' && !reason.includes(e.code)) reason += ` (${e.code})`;
  }
  return reason;
}
