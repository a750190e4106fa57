import type { QueuedActionKind } from '@shared/schemas/offline';
import { offlineDb, type QueuedAction, type QueuedBody, type Refusal, type StationMark } from '../db';

export interface NewQueuedAction {
  memberId: number;
  kind: QueuedActionKind;
  code: string;
  what: string;
  body: QueuedBody;
  catalogueAt: string;
  /** Only for an action done at a crib station. */
  station?: StationMark;
}

/**
 * A fresh idempotency key. `randomUUID` exists only in a secure context; a phone on plain
 * `http://<laptop>` still has `getRandomValues`, which makes a key as good.
 */
export function newIdempotencyKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, '0')).join('');
}

/**
 * Puts an action at the end of the queue with a fresh idempotency key and the phone's time. The
 * time never goes before the copy it was made from (a phone clock running slow).
 */
export async function enqueue(action: NewQueuedAction, now: Date = new Date()): Promise<QueuedAction> {
  const performedAt = new Date(Math.max(now.getTime(), new Date(action.catalogueAt).getTime())).toISOString();
  const entry: Omit<QueuedAction, 'seq'> = { ...action, key: newIdempotencyKey(), performedAt, state: 'waiting' };
  const seq = await offlineDb.actions.add(entry);
  return { ...entry, seq };
}

/** One member's entries in one state, oldest first: the phone's own, never a station's. */
export async function entriesOf(memberId: number, state: QueuedAction['state']): Promise<QueuedAction[]> {
  return (await offlineDb.actions.where({ memberId, state }).sortBy('seq')).filter((a) => a.station === undefined);
}

export const waitingOf = (memberId: number) => entriesOf(memberId, 'waiting');
export const refusedOf = (memberId: number) => entriesOf(memberId, 'refused');

/** The first action still waiting to be sent, in the order the member did them. */
export async function nextWaiting(memberId: number): Promise<QueuedAction | undefined> {
  return (await waitingOf(memberId))[0];
}

export async function markSent(seq: number): Promise<void> {
  await offlineDb.actions.delete(seq);
}

export async function markRefused(seq: number, refusal: Refusal): Promise<void> {
  await offlineDb.actions.update(seq, { state: 'refused', refusal });
}

/** The member has read a refusal: it leaves the Not sent list. Only refused entries can go. */
export async function dismissRefused(seq: number, memberId: number): Promise<void> {
  await offlineDb.transaction('rw', offlineDb.actions, async () => {
    const entry = await offlineDb.actions.get(seq);
    if (entry?.memberId === memberId && entry.station === undefined && entry.state === 'refused') await offlineDb.actions.delete(seq);
  });
}
