import { Router } from 'express';
import { resetConfirmBodySchema, resetRequestBodySchema } from '@shared/schemas/auth';
import { parseInput } from '../../lib/validate';
import { confirmPasswordReset, requestPasswordReset } from './password-reset.service';

export function passwordResetRouter() {
  const router = Router();

  router.post('/', (req, res) => {
    const body = parseInput(resetRequestBodySchema, req.body);
    requestPasswordReset(req.ctx, body.email);
    res.status(202).json({
      ok: true,
      message: 'If that address belongs to an active account, a reset link is on its way. It works for 1 hour.',
    });
  });

  router.post('/confirm', async (req, res) => {
    const body = parseInput(resetConfirmBodySchema, req.body);
    await confirmPasswordReset(req.ctx, body.token, body.password);
    res.json({ ok: true, message: 'Your password has been changed. Sign in with the new one.' });
  });

  return router;
}
