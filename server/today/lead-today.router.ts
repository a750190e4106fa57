import { Router } from 'express';
import { requireRole } from '../middleware/auth';
import { leadToday } from './lead-today.service';

/** `GET /api/today/lead`: what needs a chapter lead today. */
export function leadTodayRouter() {
  const router = Router();
  router.use(requireRole('lead'));
  router.get('/', (req, res) => {
    res.json(leadToday(req.ctx));
  });
  return router;
}
