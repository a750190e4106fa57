import type { Request } from 'express';
import type { SessionData } from 'express-session';
import { csrf } from '../middleware/csrf';

/**
 * Starts a fresh session for the person (a new id at sign-in) and returns the new CSRF token;
 * `extra` marks what kind of session it is (a station session).
 */
export async function signInSession(req: Request, userId: number, extra: Partial<SessionData> = {}): Promise<string> {
  await new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err as Error) : resolve())));
  Object.assign(req.session, extra);
  req.session.userId = userId;
  const token = csrf.generateToken(req, true);
  await new Promise<void>((resolve, reject) => req.session.save((err) => (err ? reject(err as Error) : resolve())));
  return token;
}

export async function endSession(req: Request): Promise<void> {
  if (!req.session) return;
  await new Promise<void>((resolve, reject) => req.session.destroy((err) => (err ? reject(err as Error) : resolve())));
}
