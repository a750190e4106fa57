import { Router } from 'express';
import { requireRole, requireUser } from '../../middleware/auth';
import { takeCatalogue } from './offline.service';

/** /api/offline: what a phone keeps so a scan still works when the hangar Wi-Fi drops out. */
export function offlineRouter() {
  const router = Router();
  router.use(requireRole('member'));

  router.get('/catalogue', (req, res) => {
    res.json(takeCatalogue(req.ctx, requireUser(req)));
  });

  return router;
}
