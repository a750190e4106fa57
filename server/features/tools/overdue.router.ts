import { Router } from 'express';
import { loanIdParams } from '@shared/schemas/overdue';
import { requireRole, requireUser } from '../../middleware/auth';
import { parseInput } from '../../lib/validate';
import { listOverdue, sendReminderNow } from './overdue.service';

/** The lead's overdue list and the "send a reminder now" action. */
export function overdueRouter() {
  const router = Router();
  router.use(requireRole('lead'));

  router.get('/', (req, res) => {
    res.json(listOverdue(req.ctx));
  });

  router.post('/:loanId/remind', async (req, res) => {
    const { loanId } = parseInput(loanIdParams, req.params, 'path');
    res.status(201).json(await sendReminderNow(req.ctx, requireUser(req), loanId));
  });

  return router;
}
