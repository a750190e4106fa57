import { Router } from 'express';
import type { RequestHandler } from 'express';
import { loginBodySchema } from '@shared/schemas/auth';
import { noFieldsBodySchema } from '@shared/schemas/fields';
import { toUser } from '../../accounts/public-user';
import { csrf } from '../../middleware/csrf';
import { SESSION_COOKIE } from '../../middleware/session';
import { endSession, signInSession } from '../../lib/session-helpers';
import { parseInput } from '../../lib/validate';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { authenticate } from './auth.service';

export function authRouter(loginLimiters: RequestHandler[]) {
  const router = Router();

  router.get('/csrf', (req, res) => {
    res.json({ token: csrf.generateToken(req) });
  });

  router.post('/login', ...loginLimiters, async (req, res) => {
    const body = parseInput(loginBodySchema, req.body);
    const user = await authenticate(req.ctx, body.email, body.password);
    const csrfToken = await signInSession(req, user.id);
    res.json({ user: toUser(user), timeZone: readChapterTimeZone(req.ctx.db), csrfToken });
  });

  router.get('/me', (req, res) => {
    res.json({ user: req.user ? toUser(req.user) : null, timeZone: readChapterTimeZone(req.ctx.db) });
  });

  router.post('/logout', async (req, res) => {
    parseInput(noFieldsBodySchema, req.body);
    await endSession(req);
    res.clearCookie(SESSION_COOKIE, { path: '/' });
    res.status(204).end();
  });

  return router;
}
