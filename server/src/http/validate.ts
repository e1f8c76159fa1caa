import type { Request } from 'express';
import type { z } from 'zod';
import { HttpError } from './errors';

/** Parses a request part with the shared schema; a ZodError reaches the error handler as a 400 with field errors. */
export const body = <S extends z.ZodType>(req: Request, schema: S): z.infer<S> => schema.parse(req.body ?? {});
export const query = <S extends z.ZodType>(req: Request, schema: S): z.infer<S> => schema.parse(req.query);
export const params = <S extends z.ZodType>(req: Request, schema: S): z.infer<S> => schema.parse(req.params);

/**
 * A numeric id from the path, for the group checks that run before a route's own `params` parse. Anything that is
 * not a whole number from 1 up names no record: "not found", before a query sees it.
 */
export const paramId = (req: Request, name: string): number => {
  const raw = String(req.params[name] ?? '');
  const id = /^\d{1,15}$/.test(raw) ? Number(raw) : NaN;
  if (!Number.isSafeInteger(id) || id <= 0) throw new HttpError(404, 'not-found', 'That record was not found.');
  return id;
};
