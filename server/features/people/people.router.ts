import { Router } from 'express';
import { idParam } from '@shared/schemas/fields';
import { updatePersonBodySchema } from '@shared/schemas/people';
import { z } from 'zod';
import { requireRole, requireUser } from '../../middleware/auth';
import { parseInput } from '../../lib/validate';
import { listPeople, updatePerson } from './people.service';

const idParams = z.object({ id: idParam });

export function peopleRouter() {
  const router = Router();
  router.use(requireRole('lead'));

  router.get('/', (req, res) => {
    res.json({ data: listPeople(req.ctx) });
  });

  router.patch('/:id', (req, res) => {
    const { id } = parseInput(idParams, req.params, 'path');
    const body = parseInput(updatePersonBodySchema, req.body);
    res.json(updatePerson(req.ctx, requireUser(req), id, body));
  });

  return router;
}
