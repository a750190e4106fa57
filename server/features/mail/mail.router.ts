import { Router } from 'express';
import { noFieldsBodySchema } from '@shared/schemas/fields';
import { mailIdParams } from '@shared/schemas/mail';
import { parseInput } from '../../lib/validate';
import { requireRole, requireUser } from '../../middleware/auth';
import { listMyMail, listSentMail, retryMail } from './mail.service';

export function mailRouter(catching: boolean) {
  const router = Router();
  const lead = requireRole('lead');

  router.get('/', lead, (req, res) => {
    res.json({ data: listSentMail(req.ctx, requireUser(req)), catching });
  });

  router.get('/mine', requireRole('member'), (req, res) => {
    res.json({ data: listMyMail(req.ctx, requireUser(req)), catching });
  });

  router.post('/:id/retry', lead, (req, res) => {
    const { id } = parseInput(mailIdParams, req.params, 'path');
    parseInput(noFieldsBodySchema, req.body);
    res.json(retryMail(req.ctx, requireUser(req), id));
  });

  return router;
}
