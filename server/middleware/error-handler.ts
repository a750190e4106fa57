import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ErrorEnvelope } from '@shared/schemas/errors';
import { HttpError } from '../lib/http-error';

function envelope(code: string, message: string, issues?: ErrorEnvelope['error']['issues']): ErrorEnvelope {
  return { error: issues ? { code, message, issues } : { code, message } };
}

/** The JSON a known error answers with (also stored to replay an idempotent refusal). */
export const httpErrorBody = (err: HttpError): ErrorEnvelope => envelope(err.code, err.message, err.issues);

/** Unknown /api paths answer 404 in the same envelope as every other failure. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, 'NOT_FOUND', `There is no API at ${req.method} ${req.originalUrl}.`));
};

interface ParserError {
  type?: string;
  status?: number;
  code?: string;
  message?: string;
}

/** The one error handler, registered last: known errors keep their status; anything else is a logged 500. */
export const errorHandler: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  if (err instanceof HttpError) {
    if (err.headers) res.set(err.headers);
    res.status(err.status).json(httpErrorBody(err));
    return;
  }
  const e = (err ?? {}) as ParserError;
  if (e.code === 'CSRF_TOKEN_INVALID') {
    res.status(403).json(envelope('CSRF_TOKEN_INVALID', e.message ?? 'Missing or wrong CSRF token.'));
    return;
  }
  if (e.type === 'entity.parse.failed') {
    res.status(400).json(envelope('INVALID_JSON', 'The request body is not valid JSON.'));
    return;
  }
  if (e.type === 'entity.too.large') {
    res.status(413).json(envelope('BODY_TOO_LARGE', 'The request body is too large.'));
    return;
  }
  if (e.type === 'encoding.unsupported' || e.type === 'charset.unsupported') {
    res.status(415).json(envelope('UNSUPPORTED_ENCODING', 'Send the body as UTF-8 JSON.'));
    return;
  }
  req.log?.error({ err }, 'unhandled error');
  res.status(500).json(envelope('INTERNAL_ERROR', 'Something went wrong on the server. It has been logged; try again.'));
};
