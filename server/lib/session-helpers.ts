import type { Request } from 'express';
import type { Database } from '../db/client';
import { csrf } from '../middleware/csrf';

/** Starts a fresh session for the person (a new id at sign-in) and returns the new CSRF token. */
export async function signInSession(req: Request, userId: number): Promise<string> {
  await new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err as Error) : resolve())));
  req.session.userId = userId;
  const token = csrf.generateToken(req, true);
  await new Promise<void>((resolve, reject) => req.session.save((err) => (err ? reject(err as Error) : resolve())));
  return token;
}

export async function endSession(req: Request): Promise<void> {
  if (!req.session) return;
  await new Promise<void>((resolve, reject) => req.session.destroy((err) => (err ? reject(err as Error) : resolve())));
}

/** Signs a person out everywhere (password reset, deactivation). */
export function endSessionsOf(db: Database, userId: number): number {
  return db.$client.prepare("delete from sessions where json_extract(sess, '$.userId') = ?").run(userId).changes;
}
