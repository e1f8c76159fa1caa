import { paramId } from '../http/validate';
import type { Request, RequestHandler } from 'express';
import type { GroupRole } from '../../../shared/constants';
import { holdsGroupRole } from '../../../shared/permissions';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { Db } from '../db/client';
import { HttpError } from '../http/errors';
import { loadSessionUser } from './queries';
import { signInExpired } from './session';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      user?: SessionUser;
    }
  }
}

export const unauthenticated = () => new HttpError(401, 'unauthenticated', 'Sign in to continue.');

/**
 * Loads the signed-in user (if any) once per request; roles are read fresh so a revoked role takes effect at once.
 * A sign-in older than the absolute lifetime is dropped here, so activity cannot keep it alive for ever.
 */
export function loadUser(db: Db, absoluteHours: number, now: () => number = Date.now): RequestHandler {
  return async (req, _res, next) => {
    const id = req.session?.userId;
    if (id && signInExpired(req.session.signedInAt, absoluteHours, now())) {
      delete req.session.userId;
      delete req.session.signedInAt;
    } else if (id) {
      const user = await loadSessionUser(db, id);
      if (user) req.user = user;
      else delete req.session.userId;
    }
    next();
  };
}

export const requireUser: RequestHandler = (req, _res, next) => next(req.user ? undefined : unauthenticated());

export const requireAdmin: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(unauthenticated());
  next(req.user.admin ? undefined : new HttpError(403, 'forbidden', 'Only platform admins can do this.'));
};

/** The same rule the screens read (shared/permissions), so a form is offered only to someone allowed to send it. */
export function hasGroupRole(user: SessionUser | undefined, groupId: number, roles: readonly GroupRole[]): boolean {
  return holdsGroupRole(user, groupId, roles);
}

/** Allows the request when the user holds one of `roles` in the group named by the request (admins always). */
export function requireGroupRole(
  roles: readonly GroupRole[],
  groupIdOf: (req: Request) => number | Promise<number>,
): RequestHandler {
  return async (req, _res, next) => {
    if (!req.user) return next(unauthenticated());
    const groupId = await groupIdOf(req);
    // No such group: admins go on (the route answers 400 or 404), everyone else is refused before validation.
    if (!Number.isInteger(groupId) || groupId <= 0)
      return next(
        req.user.admin ? undefined : new HttpError(403, 'forbidden', 'Your role in this group does not allow this.'),
      );
    next(
      hasGroupRole(req.user, groupId, roles)
        ? undefined
        : new HttpError(403, 'forbidden', 'Your role in this group does not allow this.'),
    );
  };
}

export const groupIdParam = (req: Request) => paramId(req, 'groupId');

export const groupIdInBody = (req: Request) => Number(req.body?.groupId);
