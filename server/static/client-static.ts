import { existsSync } from 'node:fs';
import type { ServerResponse } from 'node:http';
import { join, relative, sep } from 'node:path';
import express, { type Request, type Response } from 'express';
import expressStaticGzip from 'express-static-gzip';

/** Vite names every file under assets/ by its content hash: a changed file is a new URL. */
const HASHED = `assets${sep}`;
const IMMUTABLE = 'public, max-age=31536000, immutable';
/** Everything else (index.html, a service worker, a web manifest) is checked again on each use. */
const REVALIDATE = 'no-cache';

/**
 * The built client: each file as its brotli or gzip copy made at build time (whichever the browser
 * accepts, brotli first), with `Vary: Accept-Encoding`. Hashed assets are cached for a year; other
 * files and the page itself revalidate by ETag. Client routes get index.html; a missing asset is a
 * 404, never the page in its place.
 */
export function clientStatic(clientDir: string): express.Router {
  const router = express.Router();
  if (!existsSync(join(clientDir, 'index.html'))) return router;

  const files = expressStaticGzip(clientDir, {
    enableBrotli: true,
    orderPreference: ['br', 'gzip'],
    index: false,
    serveStatic: {
      index: false,
      redirect: false,
      cacheControl: false,
      setHeaders: (res: ServerResponse, path: string) => {
        res.setHeader('Cache-Control', relative(clientDir, path).startsWith(HASHED) ? IMMUTABLE : REVALIDATE);
      },
    },
  });

  router.use(files);
  router.use('/assets', (_req, res) => {
    res.status(404).type('text/plain').send('Not found');
  });
  router.use((req: Request, res: Response, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    req.url = '/index.html';
    files(req, res, next);
  });
  return router;
}
