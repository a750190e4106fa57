import type { NextFunction, Request, Response } from 'express';
import { hasRole, type Role } from '@shared/roles';
import { loadUserById } from '../accounts/users.repo';
import type { Database } from '../db/client';
import type { UserRow } from '../db/schema/users';
import { HttpError } from '../lib/http-error';
import { endSessionsOf } from '../session/sessions-of';
import { SESSION_COOKIE } from './session';

declare module 'express-serve-static-core' {
  interface Request {
    user?: UserRow;
  }
}

/**
 * Loads the signed-in person on every request. A session whose person is gone or deactivated (even
 * by a change made outside the People screens) ends, with the person's other sessions, and the
 * request answers 401: nothing after this point may meet a session without its person.
 */
export function loadUser(db: Database) {
  return (req: Request, res: Response, next: NextFunction) => {
    const id = req.session?.userId;
    if (id === undefined) return next();
    const user = loadUserById(db, id);
    if (user && !user.deactivatedAt) {
      req.user = user;
      return next();
    }
    endSessionsOf(db, id);
    req.session.destroy((err) => {
      if (err) return next(err);
      res.clearCookie(SESSION_COOKIE, { path: '/' });
      next(new HttpError(401, 'NOT_SIGNED_IN', 'Your session has ended: this account is no longer active. Sign in again, or ask a chapter lead.'));
    });
  };
}

export function requireUser(req: Request): UserRow {
  if (!req.user) throw new HttpError(401, 'NOT_SIGNED_IN', 'Sign in to continue.');
  return req.user;
}

/** Guard for a router: 401 when signed out, 403 when the role is below `role`. */
export function requireRole(role: Role) {
  return (req: Request, _res: Response, next: NextFunction) => {
    const user = requireUser(req);
    if (!hasRole(user.role, role)) {
      throw new HttpError(403, 'FORBIDDEN', `Only a ${role === 'lead' ? 'chapter lead' : role} can do this.`);
    }
    next();
  };
}
