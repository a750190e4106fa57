import { ApiError } from '@/lib/api-client';
import type { QueuedAction, Refusal } from '../db';
import { nextStepFor } from './next-step';

/** Answers that say "not now" rather than "no": a lapsed session, a stale token, the same key still being handled. */
const TRY_AGAIN_STATUSES = [401, 408, 429];
const TRY_AGAIN_CODES = ['CSRF_TOKEN_INVALID', 'IDEMPOTENCY_KEY_IN_USE'];

/**
 * A refusal is the server's final word on that action: it goes to the Not sent list. No answer, a
 * server hiccup or a "not now" says nothing about the action: keep it and stop, so nothing after it
 * goes ahead of it.
 */
export function isRefusal(err: unknown): err is ApiError {
  return err instanceof ApiError && err.status >= 400 && err.status < 500 && !TRY_AGAIN_STATUSES.includes(err.status) && !TRY_AGAIN_CODES.includes(err.code);
}

/** What the Not sent list keeps of a refusal: the server's sentence and what the member can do. */
export function refusalOf(entry: Pick<QueuedAction, 'kind'>, err: ApiError, now: Date = new Date()): Refusal {
  return { status: err.status, code: err.code, message: err.message, nextStep: nextStepFor(entry.kind, err.code), at: now.toISOString() };
}
