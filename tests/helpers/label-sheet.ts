import type { Response } from 'superagent';
import { findSheetLayout } from '../../labels/layouts';
import { pageSizeInPoints } from '../../labels/sheet-geometry';
import { pdfRects, pdfStreams } from './pdf-read';
import { decodeQrPng, rectsToPng } from './qr-raster';
import type { SignedInAgent } from './test-app';

/** Collects a PDF answer as bytes; a JSON answer (an error) is parsed as usual. */
function bytesOrJson(res: Response, done: (err: Error | null, body: unknown) => void) {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => {
    const body = Buffer.concat(chunks);
    done(null, String(res.headers['content-type']).startsWith('application/json') ? JSON.parse(body.toString('utf8')) : body);
  });
}

/** POST /api/labels/sheet as `who`: the body is the PDF's bytes, or the error's JSON. */
export const postSheet = (who: SignedInAgent, body: unknown) =>
  who.agent.post('/api/labels/sheet').set('X-CSRF-Token', who.csrf).send(body as object).buffer(true).parse(bytesOrJson);

/** What the QR codes of a one-label-a-page sheet in `layoutId` hold, page by page (null where none reads). */
export function qrTextsOnSheet(pdf: Buffer, layoutId: string): (string | null)[] {
  const page = pageSizeInPoints(findSheetLayout(layoutId)!);
  return pdfStreams(pdf)
    .filter((s) => pdfRects(s).length > 0)
    .map((content) => decodeQrPng(rectsToPng(page.width, page.height, pdfRects(content), 8)));
}
