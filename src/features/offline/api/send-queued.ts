import { CATALOGUE_AT_HEADER, IDEMPOTENCY_KEY_HEADER, PERFORMED_AT_HEADER, type QueuedActionKind } from '@shared/schemas/offline';
import { api, ANSWER_TIMEOUT_MS } from '@/lib/api-client';
import type { QueuedAction } from '../db';

const PATHS: Record<QueuedActionKind, (code: string) => string> = {
  check_out: (code) => `/api/tools/${encodeURIComponent(code)}/checkout`,
  return: (code) => `/api/tools/${encodeURIComponent(code)}/return`,
  draw: (code) => `/api/bins/${encodeURIComponent(code)}/draw`,
  return_unused: (code) => `/api/bins/${encodeURIComponent(code)}/return`,
};

/** Sends one queued action as the online page would, plus its key and its two moments. */
export function sendQueued(entry: QueuedAction): Promise<unknown> {
  return api.post<unknown>(PATHS[entry.kind](entry.code), entry.body, {
    timeoutMs: ANSWER_TIMEOUT_MS,
    headers: {
      [IDEMPOTENCY_KEY_HEADER]: entry.key,
      [PERFORMED_AT_HEADER]: entry.performedAt,
      [CATALOGUE_AT_HEADER]: entry.catalogueAt,
    },
  });
}
