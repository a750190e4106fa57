import { Router } from 'express';
import { noFieldsBodySchema } from '@shared/schemas/fields';
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

  router.post('/:loanId/remind', (req, res) => {
    const { loanId } = parseInput(loanIdParams, req.params, 'path');
    parseInput(noFieldsBodySchema, req.body);
    res.status(201).json(sendReminderNow(req.ctx, requireUser(req), loanId));
  });

  return router;
}
