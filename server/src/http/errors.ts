import type { ErrorRequestHandler, RequestHandler } from 'express';
import { logReason } from '../db/log-reason';
import { ZodError } from 'zod';
import { lockConflict } from '../db/retry';
import { redactUrl } from './redact';
import { isMessageKey, languageOf, translate } from '../i18n';
import type { Language } from '../../../shared/i18n/languages';

/** A field's message: a catalog key or an English refusal (see translate), or a wording in the request's language. */
export type FieldMessage = string | ((lang: Language) => string);

/** The one error type services throw; the handler turns it into `{"error":{code,message,fields?}}`. */
export class HttpError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public fields?: Record<string, FieldMessage>,
    /** Values of a catalog message; a value that is itself a catalog key (a status's name) is put in the reader's language. */
    public values?: Record<string, string | number>,
  ) {
    super(message);
  }
}

export const notFound = (what = 'That'): HttpError => new HttpError(404, 'not-found', `${what} was not found.`);
export const forbidden = (): HttpError => new HttpError(403, 'forbidden', 'Your role does not allow this.');

export function zodFields(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(
    new HttpError(404, 'not-found', 'problems.noRoute', undefined, {
      method: req.method,
      path: req.path,
    }),
  );
};

/** The driver's error code, also when the ORM wraps the driver error and keeps it as the cause. */
export const driverCode = (err: unknown): string | undefined => {
  const e = err as { code?: unknown; cause?: { code?: unknown } } | null;
  const code = typeof e?.code === 'string' ? e.code : e?.cause?.code;
  return typeof code === 'string' ? code : undefined;
};

/** Driver codes that mean "the database cannot be reached or did not answer in time", not "the request is wrong". */
const UNAVAILABLE = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ECONNABORTED',
  'EPIPE',
  'ETIMEDOUT',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'ENOTFOUND',
  'EAI_AGAIN',
  'PROTOCOL_CONNECTION_LOST',
  'PROTOCOL_SEQUENCE_TIMEOUT',
  'PROTOCOL_ENQUEUE_AFTER_FATAL_ERROR',
  'POOL_ACQUIRE_TIMEOUT',
  'ER_CON_COUNT_ERROR',
  'ER_SERVER_SHUTDOWN',
  'ER_CONNECTION_KILLED',
  'ER_QUERY_INTERRUPTED',
]);
/**
 * MariaDB's own error numbers mysql2 has no code for: 1969 is max_statement_time exceeded (ER_STATEMENT_TIMEOUT);
 * 1047 is what a Galera node answers while it is not ready for queries (joining, or cut off from the others);
 * 1180 (ER_ERROR_DURING_COMMIT) is its answer to a commit it could not replicate, e.g. "Not connected to Primary
 * Component" while a node of the cluster has just died: the transaction was rolled back, so trying again is right.
 */
const UNAVAILABLE_ERRNOS = new Set([1969, 1047, 1180]);
/** mysql2's messages without a code, for a pool or connection that is already closed. */
const UNAVAILABLE_MESSAGES = [
  'Pool is closed.',
  "Can't add new command when connection is in closed state",
  "Can't write in closed state",
  'No connections available.',
];

/**
 * True when an error, or any error it wraps (Drizzle keeps the driver's error as the cause), says the database is
 * unreachable, closed or too slow: answered with 503 and Retry-After rather than 500. Fatal mysql2 errors are all
 * about the connection, never about the statement.
 */
export function databaseUnavailable(err: unknown): boolean {
  type Cause = { code?: unknown; errno?: unknown; message?: unknown; fatal?: unknown; cause?: unknown };
  let e = err as Cause | null | undefined;
  for (let depth = 0; e && typeof e === 'object' && depth < 5; depth++, e = e.cause as typeof e) {
    if (typeof e.code === 'string' && UNAVAILABLE.has(e.code)) return true;
    if (typeof e.errno === 'number' && UNAVAILABLE_ERRNOS.has(e.errno)) return true;
    if (typeof e.message === 'string' && UNAVAILABLE_MESSAGES.includes(e.message)) return true;
    if (e.fatal === true) return true;
  }
  return false;
}

/** body-parser's refusals (http-errors with a 4xx status and a `type`), as our own. */
function bodyParserError(err: { type?: unknown; status?: unknown; expose?: unknown }): HttpError | null {
  if (typeof err?.status !== 'number' || err.status < 400 || err.status >= 500) return null;
  if (typeof err.type !== 'string' && err.expose !== true) return null;
  if (err.type === 'entity.too.large') return new HttpError(413, 'too-large', 'The request is too large.');
  if (err.type === 'entity.parse.failed') return new HttpError(400, 'bad-json', 'The request body is not valid JSON.');
  if (err.type === 'charset.unsupported' || err.type === 'encoding.unsupported')
    return new HttpError(415, 'unsupported', 'Send the body as UTF-8 JSON, plain or gzip-compressed.');
  return new HttpError(400, 'bad-body', 'The request body could not be read. Send it again.');
}

/** Refuses text that holds half of a UTF-16 surrogate pair: it cannot be stored or shown. */
export const wellFormedText: RequestHandler = (req, _res, next) => {
  const broken = (v: unknown, depth = 0): boolean => {
    if (typeof v === 'string') return /\p{Surrogate}/u.test(v);
    if (depth > 32 || v === null || typeof v !== 'object') return false;
    return Object.entries(v).some(([k, x]) => /\p{Surrogate}/u.test(k) || broken(x, depth + 1));
  };
  if (broken(req.body) || broken(req.query))
    return next(new HttpError(400, 'bad-text', 'Some text holds a broken character. Type it again and resend.'));
  next();
};

export function errorHandler(log: (msg: string, err: unknown) => void = console.error): ErrorRequestHandler {
  return (err, req, res, _next) => {
    let e: HttpError;
    if (err instanceof HttpError) e = err;
    else if (err instanceof ZodError) e = new HttpError(400, 'invalid', 'errors.invalid', zodFields(err));
    else if (err?.code === 'EBADCSRFTOKEN' || err?.message === 'invalid csrf token')
      e = new HttpError(403, 'csrf', 'The form expired or came from elsewhere. Reload the page and try again.');
    else if (err instanceof URIError)
      e = new HttpError(400, 'bad-url', 'The address holds a broken %-escape. Check the link and try again.');
    else if (bodyParserError(err)) e = bodyParserError(err)!;
    else if (driverCode(err) === 'ER_DUP_ENTRY') e = new HttpError(409, 'duplicate', 'That exists already.');
    else if (lockConflict(err)) {
      // Deadlocks (on Galera, certification conflicts too) that outlasted the transaction's retries: nothing was
      // written, and the same request will most likely go through a moment later.
      e = new HttpError(503, 'busy', 'Many people are doing this at once. Try again in a moment.');
      if (!res.headersSent) res.set('Retry-After', '1');
    } else if (databaseUnavailable(err)) {
      log(`database unavailable on ${req.method} ${redactUrl(req.originalUrl)}`, logReason(err));
      e = new HttpError(503, 'unavailable', 'The database is not reachable just now. Try again in a moment.');
      if (!res.headersSent) res.set('Retry-After', '5');
    } else {
      log(`unhandled error on ${req.method} ${redactUrl(req.originalUrl)}`, err);
      e = new HttpError(500, 'internal', 'Something went wrong on our side. It has been logged.');
    }
    if (res.headersSent) return;
    // Messages that are catalog keys (the shared schemas' validation.* keys, errors.*) go out in the reader's language.
    const lang = languageOf(req, res.locals);
    const fields = e.fields
      ? Object.fromEntries(
          Object.entries(e.fields).map(([k, v]) => [k, typeof v === 'function' ? v(lang) : translate(lang, v)]),
        )
      : undefined;
    const values = e.values
      ? Object.fromEntries(
          Object.entries(e.values).map(([k, v]) => [
            k,
            typeof v === 'string' && isMessageKey(v) ? translate(lang, v) : v,
          ]),
        )
      : undefined;
    res
      .status(e.status)
      .json({ error: { code: e.code, message: translate(lang, e.message, values), ...(fields ? { fields } : {}) } });
  };
}
