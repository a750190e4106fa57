import type { RequestHandler } from 'express';

/**
 * API answers hold a person's own data (loans, tabs, names): no browser, proxy or shared device may
 * keep them. Set on every /api answer before the routes; a route that may be kept sets its own.
 */
export const noStore: RequestHandler = (_req, res, next) => {
  res.set('Cache-Control', 'no-store');
  next();
};

/**
 * Stored files (tool photos, packing slips) never change under their id, but one may be deleted or a
 * person may lose access: only their own browser keeps them, and only for a few minutes.
 */
export const PRIVATE_FILE_CACHE = 'private, max-age=300';
