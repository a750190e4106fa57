import type { ErrorIssue } from '@shared/schemas/errors';

/** An error a person can act on: the status, a stable UPPER_SNAKE code and a sentence. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues?: ErrorIssue[],
    /** Headers the answer carries too (Retry-After on a lock). */
    readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}
