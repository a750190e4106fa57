import express, { Router, type Request } from 'express';
import { binImportBodySchema, ledgerExportQuerySchema } from '@shared/schemas/bin-import';
import { decodeCsvBytes, lineWithReplacementCharacter } from '@shared/stock/csv-text';
import { chapterDay } from '@shared/time/chapter-time';
import { HttpError } from '../../lib/http-error';
import { requireRole, requireUser } from '../../middleware/auth';
import { sendCsv } from '../../lib/csv';
import { parseInput } from '../../lib/validate';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { commitImport, previewImport } from './bin-import.service';
import { binsCsv, ledgerCsv, templateCsv } from './stock-export.service';

/** JSON-escaped quotes and line breaks make the body larger than the 2 MB of CSV it carries. */
const IMPORT_BODY_LIMIT = '5mb';

/**
 * Body parsers for /api/bins/import*, mounted before the API's small JSON parser (which then
 * leaves the parsed body alone): a {csv} JSON body, or the CSV file's bytes as text/csv, decoded
 * here (UTF-8, or plainly Windows-1252) rather than by the parser, which would mangle the second.
 */
export function binImportBodyParsers() {
  return [express.json({ limit: IMPORT_BODY_LIMIT }), express.raw({ type: ['text/csv', 'text/plain'], limit: IMPORT_BODY_LIMIT })];
}

function csvText(body: unknown): unknown {
  if (!Buffer.isBuffer(body)) return body;
  const decoded = decodeCsvBytes(body);
  if ('problem' in decoded) throw new HttpError(400, 'CSV_NOT_TEXT', decoded.problem);
  return { csv: decoded.text };
}

function csvOf(req: Request): string {
  const { csv } = parseInput(binImportBodySchema, csvText(req.body));
  const mangled = lineWithReplacementCharacter(csv);
  if (mangled !== undefined) {
    throw new HttpError(
      400,
      'CSV_NOT_UTF8',
      `Line ${mangled} holds characters that were lost when the file was read as UTF-8 (shown as �). In the spreadsheet, save it as "CSV UTF-8" and choose it again.`,
    );
  }
  return csv;
}

/**
 * /api/bins CSV import and export, mounted before the bins router (whose /:code would take
 * /export.csv). Every route guards itself: paths not matched here fall through to the bins router.
 */
export function binCsvRouter() {
  const router = Router();
  const quartermaster = requireRole('quartermaster');

  router.get('/import/template.csv', quartermaster, (_req, res) => {
    sendCsv(res, 'gripline-bins-template.csv', templateCsv());
  });

  router.post('/import/preview', quartermaster, async (req, res) => {
    res.json(await previewImport(req.ctx, csvOf(req)));
  });

  router.post('/import', quartermaster, async (req, res) => {
    res.status(201).json(await commitImport(req.ctx, requireUser(req), csvOf(req)));
  });

  router.get('/export.csv', quartermaster, (req, res) => {
    sendCsv(res, `gripline-bins-${chapterDay(req.ctx.now(), readChapterTimeZone(req.ctx.db))}.csv`, binsCsv(req.ctx));
  });

  router.get('/ledger.csv', quartermaster, (req, res) => {
    const range = parseInput(ledgerExportQuerySchema, req.query, 'query');
    sendCsv(res, `gripline-ledger-${range.from}-to-${range.to}.csv`, ledgerCsv(req.ctx, range));
  });

  return router;
}
