import { Router } from 'express';
import { idParam, noFieldsBodySchema } from '@shared/schemas/fields';
import { updatePersonBodySchema } from '@shared/schemas/people';
import { setPinBodySchema } from '@shared/schemas/stations';
import { z } from 'zod';
import { requireRole, requireUser } from '../../middleware/auth';
import { parseInput } from '../../lib/validate';
import { issueBadge } from '../../accounts/badge.service';
import { clearPin, setOwnPin } from '../../accounts/pin.service';
import { listPeople, updatePerson } from './people.service';

const idParams = z.object({ id: idParam });

export function peopleRouter() {
  const router = Router();
  // A quartermaster prints badges too; everything else here is the lead's.
  router.post('/:id/badge', requireRole('quartermaster'), (req, res) => {
    const { id } = parseInput(idParams, req.params, 'path');
    parseInput(noFieldsBodySchema, req.body);
    res.status(201).json(issueBadge(req.ctx, requireUser(req), id));
  });

  router.use(requireRole('lead'));

  router.get('/', (req, res) => {
    res.json({ data: listPeople(req.ctx) });
  });

  router.patch('/:id', (req, res) => {
    const { id } = parseInput(idParams, req.params, 'path');
    const body = parseInput(updatePersonBodySchema, req.body);
    res.json(updatePerson(req.ctx, requireUser(req), id, body));
  });

  router.delete('/:id/pin', (req, res) => {
    const { id } = parseInput(idParams, req.params, 'path');
    clearPin(req.ctx, id);
    res.status(204).end();
  });

  return router;
}

/** /api/me/pin: the signed-in person's own station PIN. */
export function myPinRouter() {
  const router = Router();
  router.use(requireRole('member'));
  router.put('/pin', async (req, res) => {
    const { pin } = parseInput(setPinBodySchema, req.body);
    await setOwnPin(req.ctx, requireUser(req), pin);
    res.status(204).end();
  });
  return router;
}
