import { Router } from 'express';
import { requireRole } from '../../middleware/auth';
import { listCaughtMail } from './mail.repo';

export function mailRouter(catching: boolean) {
  const router = Router();
  router.use(requireRole('lead'));
  router.get('/', (req, res) => {
    res.json({ data: listCaughtMail(req.ctx.db, 200), catching });
  });
  return router;
}
