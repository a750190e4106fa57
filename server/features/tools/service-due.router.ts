import { Router } from 'express';
import { requireRole } from '../../middleware/auth';
import { listServiceDue } from './service-due.service';

/** Tools out of service or due for service or calibration (quartermaster and lead). */
export function serviceDueRouter() {
  const router = Router();
  router.get('/', requireRole('quartermaster'), (req, res) => {
    res.json(listServiceDue(req.ctx));
  });
  return router;
}
