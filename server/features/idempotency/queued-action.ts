import { CATALOGUE_AT_HEADER, IDEMPOTENCY_KEY_HEADER, IDEMPOTENT_REPLAYED_HEADER, PERFORMED_AT_HEADER, queuedActionHeadersSchema } from '@shared/schemas/offline';
import { HttpError } from '../../lib/http-error';
import type { ActionAnswer, RunQueuedAction } from '../../lib/queued-action';
import { requireUser } from '../../middleware/auth';
import { runOnce } from './idempotency.service';
import { recordedPerformedAt } from './performed-at';

const HEADERS = [IDEMPOTENCY_KEY_HEADER, PERFORMED_AT_HEADER, CATALOGUE_AT_HEADER] as const;

/** The queue's headers, checked; a bad one is 400 INVALID_HEADER naming it. */
function readHeaders(get: (name: string) => string | undefined) {
  const parsed = queuedActionHeadersSchema.safeParse(Object.fromEntries(HEADERS.map((h) => [h, get(h)])));
  if (parsed.success) return parsed.data;
  const issues = parsed.error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));
  throw new HttpError(400, 'INVALID_HEADER', `The ${issues.map((i) => i.path).join(' and ')} header is not valid. ${issues.map((i) => i.message).join(' ')}`, issues);
}

/**
 * Runs a check out, return, draw or return unused that a phone may have queued offline: at the
 * recorded performed-at, and at most once per Idempotency-Key (a repeat answers the first result
 * with Idempotent-Replayed: true).
 */
export const runQueuedAction: RunQueuedAction = (req, res, action) => {
  const headers = readHeaders((name) => req.get(name));
  const performedAt = recordedPerformedAt(req.ctx.now(), headers[PERFORMED_AT_HEADER], headers[CATALOGUE_AT_HEADER]);
  const key = headers[IDEMPOTENCY_KEY_HEADER];
  let answer: ActionAnswer & { replayed?: boolean };
  if (key === undefined) {
    answer = action(performedAt);
  } else {
    const user = requireUser(req);
    answer = runOnce(req.ctx, { userId: user.id, key, method: req.method, path: req.baseUrl + req.path, body: req.body }, () => action(performedAt));
    if (answer.replayed) res.setHeader(IDEMPOTENT_REPLAYED_HEADER, 'true');
  }
  res.status(answer.status).json(answer.body);
};
