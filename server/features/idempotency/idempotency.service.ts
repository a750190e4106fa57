import { createHash } from 'node:crypto';
import { IDEMPOTENCY_KEEP_DAYS } from '@shared/schemas/offline';
import type { ServiceContext } from '../../context';
import { HttpError } from '../../lib/http-error';
import type { ActionAnswer } from '../../lib/queued-action';
import { isUniqueViolation } from '../../lib/sqlite-errors';
import { httpErrorBody } from '../../middleware/error-handler';
import { deleteKeysCreatedBefore, findKey, insertKey } from './idempotency.repo';
import { DAY_MS } from '@shared/time/durations';


/** JSON with object keys sorted at every level, so the same body always hashes the same. */
function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value ?? null);
}

export const bodyHash = (body: unknown) => createHash('sha256').update(canonicalJson(body ?? {})).digest('hex');

export interface KeyedRequest {
  userId: number;
  key: string;
  method: string;
  path: string;
  body: unknown;
}

export interface OnceAnswer extends ActionAnswer {
  replayed: boolean;
}

/**
 * Runs an action at most once per (person, key). The answer is stored in the action's own
 * transaction (an immediate one, so a second copy of the request waits for the first and then
 * replays it). Refusals (4xx) are stored and replayed too; an unexpected error stores nothing.
 */
export function runOnce(ctx: ServiceContext, request: KeyedRequest, action: () => ActionAnswer): OnceAnswer {
  const hash = bodyHash(request.body);
  return ctx.db.$client
    .transaction((): OnceAnswer => {
      const found = findKey(ctx.db, request.userId, request.key);
      if (found) {
        if (found.method !== request.method || found.path !== request.path || found.bodyHash !== hash) {
          const what = found.method === request.method && found.path === request.path ? 'this action with a different body' : `${found.method} ${found.path}`;
          throw new HttpError(422, 'IDEMPOTENCY_KEY_REUSED', `This Idempotency-Key was already used for ${what}. Make a new key for each action.`);
        }
        return { status: found.status, body: JSON.parse(found.answer) as unknown, replayed: true };
      }
      let answer: ActionAnswer;
      try {
        answer = action();
      } catch (err) {
        if (!(err instanceof HttpError) || err.status >= 500) throw err;
        answer = { status: err.status, body: httpErrorBody(err) };
      }
      try {
        insertKey(ctx.db, {
          userId: request.userId,
          key: request.key,
          method: request.method,
          path: request.path,
          bodyHash: hash,
          status: answer.status,
          answer: JSON.stringify(answer.body),
          createdAt: ctx.now(),
        });
      } catch (err) {
        if (isUniqueViolation(err)) {
          throw new HttpError(409, 'IDEMPOTENCY_KEY_IN_USE', 'Another request with this Idempotency-Key is being handled. Retry shortly to get its answer.');
        }
        throw err;
      }
      return { ...answer, replayed: false };
    })
    .immediate();
}

/** Deletes keys older than IDEMPOTENCY_KEEP_DAYS (run daily by the scheduler). */
export function sweepIdempotencyKeys(ctx: ServiceContext): { deleted: number } {
  return { deleted: deleteKeysCreatedBefore(ctx.db, new Date(ctx.now().getTime() - IDEMPOTENCY_KEEP_DAYS * DAY_MS)) };
}
