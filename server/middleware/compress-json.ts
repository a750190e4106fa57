import compression from 'compression';
import type { Request, Response } from 'express';

/** Below about one packet, compressing costs more than it saves. */
const THRESHOLD_BYTES = 1024;

function isJson(res: Response): boolean {
  return /^application\/(.+\+)?json\b/.test(String(res.getHeader('Content-Type') ?? ''));
}

/**
 * Compresses JSON answers only. Files (PDF label sheets, CSV exports, photos) stream through
 * untouched: they are either compressed already or better sent as they are produced.
 */
export function compressJson() {
  return compression({
    threshold: THRESHOLD_BYTES,
    filter: (req: Request, res: Response) => isJson(res) && compression.filter(req, res),
  });
}
