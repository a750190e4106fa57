import { Router } from 'express';
import { requireRole, requireUser } from '../middleware/auth';
import { memberToday } from './member-today';

/** `GET /api/today/member`: what needs the signed-in person today (every role borrows tools). */
export function memberTodayRouter() {
  const router = Router();
  router.get('/', requireRole('member'), (req, res) => {
    res.json(memberToday(req.ctx, requireUser(req)));
  });
  return router;
}
