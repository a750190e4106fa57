import { Router } from 'express';
import { requireRole } from '../middleware/auth';
import { quartermasterToday } from './quartermaster-today';

/** `GET /api/today/quartermaster`: what needs a quartermaster today. A read only. */
export function quartermasterTodayRouter() {
  const router = Router();
  router.get('/', requireRole('quartermaster'), (req, res) => {
    res.json(quartermasterToday(req.ctx));
  });
  return router;
}
