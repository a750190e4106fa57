import type { RequestHandler } from 'express';
import { HttpError } from '../lib/http-error';

/**
 * A path the router cannot decode (`/api/tools/%`, `/%zz`) is the client's mistake: answer 400 before
 * any route, the static client or the SPA fallback tries to read it (Express would throw a URIError).
 */
export const wellFormedPath: RequestHandler = (req, _res, next) => {
  try {
    decodeURIComponent(req.path);
  } catch {
    next(new HttpError(400, 'BAD_REQUEST_PATH', 'The address has a malformed percent-encoding (a % must be followed by two hex digits of valid UTF-8). Check the link.'));
    return;
  }
  next();
};
