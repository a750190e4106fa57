import { Router } from 'express';
import { acceptInvitationBodySchema } from '@shared/schemas/auth';
import { idParam, linkTokenField } from '@shared/schemas/fields';
import { inviteBodySchema } from '@shared/schemas/people';
import { z } from 'zod';
import { toUser } from '../../accounts/public-user';
import { requireRole, requireUser } from '../../middleware/auth';
import { signInSession } from '../../lib/session-helpers';
import { parseInput } from '../../lib/validate';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import * as invitations from './invitations.service';

const tokenParams = z.object({ token: linkTokenField });
const idParams = z.object({ id: idParam });

export function invitationsRouter() {
  const router = Router();
  const lead = requireRole('lead');

  router.get('/', lead, (req, res) => {
    res.json({ data: invitations.listPendingInvitations(req.ctx) });
  });

  router.post('/', lead, (req, res) => {
    const body = parseInput(inviteBodySchema, req.body);
    res.status(201).json(invitations.invite(req.ctx, requireUser(req), body.email, body.role));
  });

  router.delete('/:id', lead, (req, res) => {
    const { id } = parseInput(idParams, req.params, 'path');
    invitations.withdrawInvitation(req.ctx, id);
    res.status(204).end();
  });

  router.get('/by-token/:token', (req, res) => {
    const { token } = parseInput(tokenParams, req.params, 'path');
    res.json(invitations.previewInvitation(req.ctx, token));
  });

  router.post('/accept', async (req, res) => {
    const body = parseInput(acceptInvitationBodySchema, req.body);
    const user = await invitations.acceptInvitation(req.ctx, body.token, body.name, body.password);
    const csrfToken = await signInSession(req, user.id);
    res.status(201).json({ user: toUser(user), timeZone: readChapterTimeZone(req.ctx.db), csrfToken });
  });

  return router;
}
