import { Router } from 'express';
import { noFieldsBodySchema } from '@shared/schemas/fields';
import { z } from 'zod';
import {
  checkoutBodySchema,
  createToolBodySchema,
  resolveAccessoryBodySchema,
  returnBodySchema,
  statusChangeBodySchema,
  toolCodeParams,
  toolListQuerySchema,
  updateToolBodySchema,
} from '@shared/schemas/tools';
import { requireRole, requireUser } from '../../middleware/auth';
import type { RunQueuedAction } from '../../lib/queued-action';
import { parseInput } from '../../lib/validate';
import { cancelHold, placeHold } from './holds.service';
import { checkOut, returnTool } from './loans.service';
import { resolveMissingAccessory } from './missing-accessories';
import { changeToolStatus, type StatusCommand } from './tool-status.service';
import { createTool, editTool, getToolForYou, listToolPage, toolHistory } from './tools.service';

const STATUS_PATHS: Record<string, StatusCommand> = {
  'out-of-service': 'out_of_service',
  'back-in-service': 'back_in_service',
  lost: 'lost',
  found: 'found',
  retire: 'retire',
};
const backInServiceBody = statusChangeBodySchema.extend({ serviced: z.boolean().default(false) });

/** `runQueuedAction` (from the app) lets a phone replay a checkout or return queued offline. */
export function toolsRouter({ runQueuedAction }: { runQueuedAction: RunQueuedAction }) {
  const router = Router();
  const signedIn = requireRole('member');
  const quartermaster = requireRole('quartermaster');
  const code = (params: unknown) => parseInput(toolCodeParams, params, 'path').code;
  router.use(signedIn);

  router.get('/', (req, res) => {
    res.json(listToolPage(req.ctx, parseInput(toolListQuerySchema, req.query, 'query')));
  });

  router.post('/', quartermaster, (req, res) => {
    res.status(201).json(createTool(req.ctx, requireUser(req), parseInput(createToolBodySchema, req.body)));
  });

  router.get('/:code', (req, res) => {
    res.json(getToolForYou(req.ctx, requireUser(req), code(req.params)));
  });

  router.patch('/:code', quartermaster, (req, res) => {
    res.json(editTool(req.ctx, requireUser(req), code(req.params), parseInput(updateToolBodySchema, req.body)));
  });

  router.get('/:code/events', (req, res) => {
    res.json({ data: toolHistory(req.ctx, code(req.params)) });
  });

  router.post('/:code/checkout', (req, res) =>
    runQueuedAction(req, res, (at) => ({
      status: 201,
      body: checkOut(req.ctx, requireUser(req), code(req.params), parseInput(checkoutBodySchema, req.body), at),
    })),
  );

  router.post('/:code/return', (req, res) =>
    runQueuedAction(req, res, (at) => ({
      status: 200,
      body: returnTool(req.ctx, requireUser(req), code(req.params), parseInput(returnBodySchema, req.body), at),
    })),
  );

  router.post('/:code/holds', (req, res) => {
    const toolCode = code(req.params);
    parseInput(noFieldsBodySchema, req.body);
    res.status(201).json(placeHold(req.ctx, requireUser(req), toolCode));
  });

  router.delete('/:code/holds/mine', (req, res) => {
    cancelHold(req.ctx, requireUser(req), code(req.params));
    res.status(204).end();
  });

  /** The quartermaster marks an accessory that did not come back found or replaced; answers what is still missing. */
  router.post('/:code/missing-accessories/resolve', quartermaster, (req, res) => {
    const toolCode = code(req.params);
    res.json({ data: resolveMissingAccessory(req.ctx, requireUser(req), toolCode, parseInput(resolveAccessoryBodySchema, req.body)) });
  });

  router.post('/:code/:command', quartermaster, (req, res, next) => {
    const command = STATUS_PATHS[String(req.params.command)];
    if (!command) return next();
    const toolCode = code({ code: req.params.code });
    const body = parseInput(command === 'back_in_service' ? backInServiceBody : statusChangeBodySchema, req.body);
    const serviced = 'serviced' in body && body.serviced === true;
    res.json(changeToolStatus(req.ctx, requireUser(req), toolCode, command, body.note, serviced));
  });

  return router;
}
