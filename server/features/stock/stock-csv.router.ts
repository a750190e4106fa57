import express, { Router, type Request } from 'express';
import { binImportBodySchema, ledgerExportQuerySchema } from '@shared/schemas/bin-import';
import { requireRole, requireUser } from '../../middleware/auth';
import { sendCsv } from '../../lib/csv';
import { parseInput } from '../../lib/validate';
import { commitImport, previewImport } from './bin-import.service';
import { binsCsv, ledgerCsv, templateCsv } from './stock-export.service';
import type { NameAssemblies } from './assembly-names';

/** JSON-escaped quotes and line breaks make the body larger than the 2 MB of CSV it carries. */
const IMPORT_BODY_LIMIT = '5mb';

/**
 * Body parsers for /api/bins/import*, mounted before the API's small JSON parser (which then
 * leaves the parsed body alone): a {csv} JSON body, or the CSV itself as text/csv.
 */
export function binImportBodyParsers() {
  return [express.json({ limit: IMPORT_BODY_LIMIT }), express.text({ type: ['text/csv', 'text/plain'], limit: IMPORT_BODY_LIMIT })];
}

const csvOf = (req: Request) => parseInput(binImportBodySchema, typeof req.body === 'string' ? { csv: req.body } : req.body).csv;

/**
 * /api/bins CSV import and export, mounted before the bins router (whose /:code would take
 * /export.csv). Every route guards itself: paths not matched here fall through to the bins router.
 */
export function binCsvRouter({ nameAssemblies }: { nameAssemblies: NameAssemblies }) {
  const router = Router();
  const quartermaster = requireRole('quartermaster');

  router.get('/import/template.csv', quartermaster, (_req, res) => {
    sendCsv(res, 'gripline-bins-template.csv', templateCsv());
  });

  router.post('/import/preview', quartermaster, (req, res) => {
    res.json(previewImport(req.ctx, csvOf(req)));
  });

  router.post('/import', quartermaster, (req, res) => {
    res.status(201).json(commitImport(req.ctx, requireUser(req), csvOf(req)));
  });

  router.get('/export.csv', quartermaster, (req, res) => {
    sendCsv(res, `gripline-bins-${req.ctx.now().toISOString().slice(0, 10)}.csv`, binsCsv(req.ctx));
  });

  router.get('/ledger.csv', quartermaster, (req, res) => {
    const range = parseInput(ledgerExportQuerySchema, req.query, 'query');
    sendCsv(res, `gripline-ledger-${range.from}-to-${range.to}.csv`, ledgerCsv(req.ctx, nameAssemblies, range));
  });

  return router;
}
