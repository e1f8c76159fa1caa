import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';

/** The one error type services throw; the handler turns it into `{"error":{code,message,fields?}}`. */
export class HttpError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public fields?: Record<string, string>,
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
  next(new HttpError(404, 'not-found', `No API route ${req.method} ${req.path}.`));
};

export function errorHandler(log: (msg: string, err: unknown) => void = console.error): ErrorRequestHandler {
  return (err, req, res, _next) => {
    let e: HttpError;
    if (err instanceof HttpError) e = err;
    else if (err instanceof ZodError) e = new HttpError(400, 'invalid', 'Some fields need attention.', zodFields(err));
    else if (err?.code === 'EBADCSRFTOKEN' || err?.message === 'invalid csrf token')
      e = new HttpError(403, 'csrf', 'The form expired or came from elsewhere. Reload the page and try again.');
    else if (err instanceof URIError)
      e = new HttpError(400, 'bad-url', 'The address holds a broken %-escape. Check the link and try again.');
    else if (err?.type === 'entity.too.large') e = new HttpError(413, 'too-large', 'The request is too large.');
    else if (err?.type === 'entity.parse.failed')
      e = new HttpError(400, 'bad-json', 'The request body is not valid JSON.');
    else if (['ECONNREFUSED', 'PROTOCOL_CONNECTION_LOST', 'ER_CON_COUNT_ERROR'].includes(err?.code)) {
      log(`database unavailable on ${req.method} ${req.originalUrl}`, err);
      e = new HttpError(503, 'unavailable', 'The database is not reachable just now. Try again in a moment.');
    } else {
      log(`unhandled error on ${req.method} ${req.originalUrl}`, err);
      e = new HttpError(500, 'internal', 'Something went wrong on our side. It has been logged.');
    }
    if (res.headersSent) return;
    res
      .status(e.status)
      .json({ error: { code: e.code, message: e.message, ...(e.fields ? { fields: e.fields } : {}) } });
  };
}
