import { Router } from 'express';
import { createSignoffBodySchema, grantSignoffBodySchema, signoffHolderParams, signoffParams, updateSignoffBodySchema } from '@shared/schemas/signoffs';
import { requireRole, requireUser } from '../../middleware/auth';
import { parseInput } from '../../lib/validate';
import { askSignoffBodySchema, declineSignoffRequestBodySchema, signoffRequestParams } from '@shared/schemas/signoff-requests';
import { askForSignoff, declineSignoffRequest, mySignoffRequests, openSignoffRequests } from './signoff-requests.service';
import { changeSignoff, defineSignoff, grantSignoff, listSignoffs, mySignoffs, revokeSignoff } from './signoffs.service';

/** Sign-offs: who may use which powered tools. Everyone may read them; only a chapter lead changes them. */
export function signoffsRouter() {
  const router = Router();
  const lead = requireRole('lead');
  router.use(requireRole('member'));

  router.get('/', (req, res) => {
    res.json({ data: listSignoffs(req.ctx) });
  });

  router.get('/mine', (req, res) => {
    res.json({ data: mySignoffs(req.ctx, requireUser(req)) });
  });

  /** Sign-off requests: a member asks from a tool's page; a lead grants (POST /:id/holders) or declines. */
  router.get('/requests', lead, (req, res) => {
    res.json({ data: openSignoffRequests(req.ctx) });
  });

  router.get('/requests/mine', (req, res) => {
    res.json({ data: mySignoffRequests(req.ctx, requireUser(req)) });
  });

  router.post('/requests', (req, res) => {
    res.status(201).json(askForSignoff(req.ctx, requireUser(req), parseInput(askSignoffBodySchema, req.body)));
  });

  router.post('/requests/:id/decline', lead, (req, res) => {
    const { id } = parseInput(signoffRequestParams, req.params, 'path');
    const { reason } = parseInput(declineSignoffRequestBodySchema, req.body);
    res.json(declineSignoffRequest(req.ctx, requireUser(req), id, reason));
  });

  router.post('/', lead, (req, res) => {
    res.status(201).json(defineSignoff(req.ctx, parseInput(createSignoffBodySchema, req.body)));
  });

  router.patch('/:id', lead, (req, res) => {
    const { id } = parseInput(signoffParams, req.params, 'path');
    res.json(changeSignoff(req.ctx, id, parseInput(updateSignoffBodySchema, req.body)));
  });

  router.post('/:id/holders', lead, (req, res) => {
    const { id } = parseInput(signoffParams, req.params, 'path');
    const { userId } = parseInput(grantSignoffBodySchema, req.body);
    res.status(201).json(grantSignoff(req.ctx, requireUser(req), id, userId));
  });

  router.delete('/:id/holders/:userId', lead, (req, res) => {
    const { id, userId } = parseInput(signoffHolderParams, req.params, 'path');
    revokeSignoff(req.ctx, requireUser(req), id, userId);
    res.status(204).end();
  });

  return router;
}
