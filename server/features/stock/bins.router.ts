import { Router } from 'express';
import {
  binCodeParams,
  binListQuerySchema,
  countBodySchema,
  createBinBodySchema,
  drawBodySchema,
  ledgerQuerySchema,
  moveBodySchema,
  movementParams,
  receiveBodySchema,
  returnUnusedBodySchema,
  reverseBodySchema,
  updateBinBodySchema,
  writeOffBodySchema,
} from '@shared/schemas/bins';
import { idParam } from '@shared/schemas/fields';
import { chapterDaySpan, startOfDayNamed } from '@shared/time/chapter-time';
import { z } from 'zod';
import { requireRole, requireUser } from '../../middleware/auth';
import { PRIVATE_FILE_CACHE } from '../../middleware/cache-control';
import { singleUpload } from '../../middleware/upload';
import type { RunQueuedAction } from '../../lib/queued-action';
import { parseInput } from '../../lib/validate';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { createBin, editBin, getBinForYou, getBinReorder, listBinPage, restockList } from './bins.service';
import { count, draw, ledgerFor, move, receive, returnUnused, reverse, writeOff } from './ledger.service';
import { readSlip, SLIP_UPLOAD, storeSlip } from './slips.service';

const slipUpload = singleUpload(SLIP_UPLOAD);

/**
 * /api/bins: the bins, their ledger, and the movements members and the quartermaster make by scan.
 * `runQueuedAction` (from the app) lets a phone replay a draw or return queued offline.
 */
export function binsRouter({ runQueuedAction }: { runQueuedAction: RunQueuedAction }) {
  const router = Router();
  const quartermaster = requireRole('quartermaster');
  const code = (params: unknown) => parseInput(binCodeParams, params, 'path').code;
  router.use(requireRole('member'));

  router.get('/', (req, res) => {
    res.json(listBinPage(req.ctx, parseInput(binListQuerySchema, req.query, 'query')));
  });

  router.post('/', quartermaster, (req, res) => {
    res.status(201).json(createBin(req.ctx, requireUser(req), parseInput(createBinBodySchema, req.body)));
  });

  router.get('/restock', quartermaster, (req, res) => {
    res.json({ data: restockList(req.ctx) });
  });

  router.post('/slips', quartermaster, slipUpload.receive, (req, res) => {
    res.status(201).json(storeSlip(req.ctx, requireUser(req), slipUpload.fileOf(req)));
  });

  router.get('/slips/:id', quartermaster, (req, res) => {
    const slip = readSlip(req.ctx, parseInput(z.object({ id: idParam }), req.params, 'path').id);
    res.set('Cache-Control', PRIVATE_FILE_CACHE).type(slip.contentType);
    res.setHeader('Content-Disposition', `inline; filename="${slip.filename}"`);
    res.send(slip.bytes);
  });

  router.get('/:code', (req, res) => {
    res.json(getBinForYou(req.ctx, requireUser(req), code(req.params)));
  });

  router.get('/:code/reorder', (req, res) => {
    res.json(getBinReorder(req.ctx, code(req.params)));
  });

  router.patch('/:code', quartermaster, (req, res) => {
    res.json(editBin(req.ctx, code(req.params), parseInput(updateBinBodySchema, req.body)));
  });

  router.get('/:code/ledger', (req, res) => {
    const q = parseInput(ledgerQuerySchema, req.query, 'query');
    const zone = readChapterTimeZone(req.ctx.db);
    const from = q.from ? startOfDayNamed(q.from, zone) : undefined;
    const to = q.to ? chapterDaySpan(q.to, q.to, zone).end : undefined;
    res.json({ data: ledgerFor(req.ctx, requireUser(req), code(req.params), from, to, q.limit) });
  });

  router.post('/:code/draw', (req, res) =>
    runQueuedAction(req, res, (at) => ({ status: 201, body: draw(req.ctx, requireUser(req), code(req.params), parseInput(drawBodySchema, req.body), at) })),
  );

  router.post('/:code/return', (req, res) =>
    runQueuedAction(req, res, (at) => ({
      status: 201,
      body: returnUnused(req.ctx, requireUser(req), code(req.params), parseInput(returnUnusedBodySchema, req.body), at),
    })),
  );

  router.post('/:code/receive', quartermaster, (req, res) => {
    res.status(201).json(receive(req.ctx, requireUser(req), code(req.params), parseInput(receiveBodySchema, req.body)));
  });

  router.post('/:code/count', quartermaster, (req, res) => {
    res.status(201).json(count(req.ctx, requireUser(req), code(req.params), parseInput(countBodySchema, req.body)));
  });

  router.post('/:code/move', quartermaster, (req, res) => {
    res.status(201).json(move(req.ctx, requireUser(req), code(req.params), parseInput(moveBodySchema, req.body)));
  });

  router.post('/:code/write-off', quartermaster, (req, res) => {
    res.status(201).json(writeOff(req.ctx, requireUser(req), code(req.params), parseInput(writeOffBodySchema, req.body)));
  });

  router.post('/:code/ledger/:id/reverse', quartermaster, (req, res) => {
    const { code: binCode, id } = parseInput(movementParams, req.params, 'path');
    res.status(201).json(reverse(req.ctx, requireUser(req), binCode, id, parseInput(reverseBodySchema, req.body)));
  });

  return router;
}
