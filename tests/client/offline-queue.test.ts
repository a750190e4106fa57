import 'fake-indexeddb/auto';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { CATALOGUE_AT_HEADER, IDEMPOTENCY_KEY_HEADER, IDEMPOTENCY_KEY_PATTERN, PERFORMED_AT_HEADER } from '@shared/schemas/offline';
import { dismissRefused, enqueue, newIdempotencyKey, refusedOf, waitingOf, type NewQueuedAction } from '@/features/offline/api/queue';
import { replayQueue } from '@/features/offline/api/replay';
import { offlineDb } from '@/features/offline/db';
import { setCsrfToken } from '@/lib/api-client';
import { fakeFetch, type FakeCall } from '../helpers/render';

const MARCO = 7;
const INES = 9;
const TAKEN_AT = '2026-12-03T08:00:00.000Z';

const checkout = (code: string, memberId = MARCO): NewQueuedAction => ({ memberId, kind: 'check_out', code, what: 'a tool', body: {}, catalogueAt: TAKEN_AT });
const draw = (code: string, quantity: number, memberId = MARCO): NewQueuedAction => ({
  memberId,
  kind: 'draw',
  code,
  what: 'a bin',
  body: { quantity },
  catalogueAt: TAKEN_AT,
});

type Answer = { status: number; body?: unknown } | 'no connection';

/**
 * A fake server: the session is `sessionUser`'s, and each queued POST gets the next answer from
 * `answers` (200 when they run out); 'no connection' makes fetch itself fail, as with no network.
 */
function server(answers: Answer[] = [], sessionUser = MARCO) {
  const posts: FakeCall[] = [];
  const respond = fakeFetch((call) => {
    if (call.path === '/api/auth/me') return { status: 200, body: { user: { id: sessionUser, name: 'x', email: 'x@example.org', role: 'member' } } };
    if (call.path === '/api/auth/csrf') return { status: 200, body: { token: 'token-1' } };
    return undefined;
  });
  const answer = vi.fn((input: string, init: RequestInit = {}) => {
    if (init.method !== 'POST') return fetchFake(input, init);
    posts.push({ method: 'POST', path: input, headers: init.headers as Record<string, string>, body: JSON.parse(init.body as string) });
    const next = answers.shift() ?? { status: 200, body: { ok: true } };
    if (next === 'no connection') return Promise.reject(new TypeError('Failed to fetch'));
    return Promise.resolve(new Response(JSON.stringify(next.body ?? {}), { status: next.status, headers: { 'Content-Type': 'application/json' } }));
  });
  const fetchFake = globalThis.fetch;
  vi.stubGlobal('fetch', answer);
  return { posts, gets: respond };
}

const refusal = (status: number, code: string, message: string): Answer => ({ status, body: { error: { code, message } } });

beforeEach(async () => {
  setCsrfToken('token-1');
  await offlineDb.actions.clear();
  await offlineDb.catalogues.clear();
});

describe('the offline queue', () => {
  it('keeps actions in the order they were done, each with its own key and the time it was done', async () => {
    const first = await enqueue(checkout('T-0042'), new Date('2026-12-03T08:05:00Z'));
    await enqueue(draw('B-0107', 50), new Date('2026-12-03T08:06:00Z'));
    await enqueue(checkout('T-0043'), new Date('2026-12-03T08:07:00Z'));
    const waiting = await waitingOf(MARCO);
    expect(waiting.map((a) => a.code)).toEqual(['T-0042', 'B-0107', 'T-0043']);
    expect(new Set(waiting.map((a) => a.key)).size).toBe(3);
    expect(first.performedAt).toBe('2026-12-03T08:05:00.000Z');
  });

  it('makes keys the server accepts, also where randomUUID is missing (plain http on the hangar network)', () => {
    expect(newIdempotencyKey()).toMatch(IDEMPOTENCY_KEY_PATTERN);
    const original = Object.getOwnPropertyDescriptor(crypto, 'randomUUID');
    Object.defineProperty(crypto, 'randomUUID', { value: undefined, configurable: true });
    try {
      const keys = [newIdempotencyKey(), newIdempotencyKey()];
      expect(keys[0]).toMatch(IDEMPOTENCY_KEY_PATTERN);
      expect(keys[1]).not.toBe(keys[0]);
    } finally {
      if (original) Object.defineProperty(crypto, 'randomUUID', original);
      else delete (crypto as { randomUUID?: unknown }).randomUUID;
    }
    expect(typeof crypto.randomUUID).toBe('function');
  });

  it('never dates an action before the copy it was made from (a phone clock running slow)', async () => {
    const entry = await enqueue(checkout('T-0042'), new Date('2026-12-03T07:00:00Z'));
    expect(entry.performedAt).toBe(TAKEN_AT);
  });
});

describe('replaying the queue', () => {
  it('sends every waiting action in order, one at a time, with its key and its two moments, and removes it', async () => {
    await enqueue(checkout('T-0042'), new Date('2026-12-03T08:05:00Z'));
    await enqueue(draw('B-0107', 50), new Date('2026-12-03T08:06:00Z'));
    const keys = (await waitingOf(MARCO)).map((a) => a.key);
    const { posts } = server();
    const settled: string[] = [];

    const result = await replayQueue(MARCO, (entry) => settled.push(entry.code));

    expect(posts.map((p) => `${p.path} ${JSON.stringify(p.body)}`)).toEqual(['/api/tools/T-0042/checkout {}', '/api/bins/B-0107/draw {"quantity":50}']);
    expect(posts.map((p) => p.headers[IDEMPOTENCY_KEY_HEADER])).toEqual(keys);
    expect(posts[1]?.headers[PERFORMED_AT_HEADER]).toBe('2026-12-03T08:06:00.000Z');
    expect(posts[1]?.headers[CATALOGUE_AT_HEADER]).toBe(TAKEN_AT);
    expect(result.stopped).toBe(false);
    expect(settled).toEqual(['T-0042', 'B-0107']);
    expect(await waitingOf(MARCO)).toEqual([]);
  });

  it('stops at the first action that gets no answer and keeps it and the rest, to send later with the same key', async () => {
    await enqueue(checkout('T-0042'));
    await enqueue(draw('B-0107', 50));
    await enqueue(checkout('T-0043'));
    const { posts } = server([{ status: 201 }, 'no connection']);

    const result = await replayQueue(MARCO);

    expect(result.stopped).toBe(true);
    expect(result.sent.map((a) => a.code)).toEqual(['T-0042']);
    expect(posts.map((p) => p.path)).toEqual(['/api/tools/T-0042/checkout', '/api/bins/B-0107/draw']);
    const left = await waitingOf(MARCO);
    expect(left.map((a) => a.code)).toEqual(['B-0107', 'T-0043']);

    const again = server();
    await replayQueue(MARCO);
    expect(again.posts.map((p) => p.path)).toEqual(['/api/bins/B-0107/draw', '/api/tools/T-0043/checkout']);
    expect(again.posts[0]?.headers[IDEMPOTENCY_KEY_HEADER]).toBe(left[0]?.key);
    expect(await waitingOf(MARCO)).toEqual([]);
  });

  it('keeps an action waiting on a server hiccup (5xx), a lapsed session (401) or its key still being handled', async () => {
    await enqueue(checkout('T-0042'));
    server([{ status: 503, body: {} }]);
    expect((await replayQueue(MARCO)).stopped).toBe(true);
    server([refusal(401, 'SIGNED_OUT', 'Sign in first.')]);
    expect((await replayQueue(MARCO)).stopped).toBe(true);
    server([refusal(409, 'IDEMPOTENCY_KEY_IN_USE', 'This request is being handled. Retry shortly.')]);
    expect((await replayQueue(MARCO)).stopped).toBe(true);
    expect((await waitingOf(MARCO)).map((a) => a.code)).toEqual(['T-0042']);
    expect(await refusedOf(MARCO)).toEqual([]);
  });

  it('moves a refused action to Not sent with the reason and what to do next, and goes on with the rest', async () => {
    await enqueue(checkout('T-0042'));
    await enqueue(draw('B-0107', 500));
    await enqueue(checkout('T-0043'));
    server([
      refusal(409, 'TOOL_ON_LOAN', 'T-0042 is on loan: held by Ines Parra until Dec 17, 2026.'),
      refusal(409, 'INSUFFICIENT_STOCK', 'Cannot draw 500 from B-0107: only 120 on hand.'),
      { status: 201 },
    ]);

    const result = await replayQueue(MARCO);

    expect(result.refused.map((a) => a.code)).toEqual(['T-0042', 'B-0107']);
    expect(result.sent.map((a) => a.code)).toEqual(['T-0043']);
    const refused = await refusedOf(MARCO);
    expect(refused.map((a) => [a.code, a.refusal?.code, a.refusal?.message, a.refusal?.nextStep])).toEqual([
      ['T-0042', 'TOOL_ON_LOAN', 'T-0042 is on loan: held by Ines Parra until Dec 17, 2026.', 'Someone else has the tool: put it back on the shelf or join the queue for it.'],
      ['B-0107', 'INSUFFICIENT_STOCK', 'Cannot draw 500 from B-0107: only 120 on hand.', 'Draw fewer or ask the quartermaster.'],
    ]);
    expect(await waitingOf(MARCO)).toEqual([]);

    // A second replay sends nothing again: a refusal is not retried, nothing goes twice.
    const again = server();
    await replayQueue(MARCO);
    expect(again.posts).toEqual([]);
  });

  it('lets the member dismiss a refusal they have read, and only a refusal of their own', async () => {
    await enqueue(checkout('T-0042'));
    server([refusal(403, 'SIGNOFF_REQUIRED', 'Needs the "Air tools" sign-off.')]);
    await replayQueue(MARCO);
    const [refused] = await refusedOf(MARCO);
    expect(refused?.refusal?.nextStep).toMatch(/sign-off/);

    await dismissRefused(refused!.seq, INES);
    expect(await refusedOf(MARCO)).toHaveLength(1);
    await dismissRefused(refused!.seq, MARCO);
    expect(await refusedOf(MARCO)).toEqual([]);
  });

  it('stops when someone signs in or out on the page while it replays', async () => {
    await enqueue(checkout('T-0042'));
    await enqueue(checkout('T-0043'));
    server();
    const result = await replayQueue(MARCO, () => setCsrfToken(undefined));
    expect(result).toMatchObject({ stopped: true });
    expect(result.sent.map((a) => a.code)).toEqual(['T-0042']);
    expect((await waitingOf(MARCO)).map((a) => a.code)).toEqual(['T-0043']);
  });

  it('sends only the signed-in member’s actions, and none when the session is someone else’s', async () => {
    await enqueue(checkout('T-0042', INES));
    await enqueue(checkout('T-0043', MARCO));

    const asInes = server([], INES);
    const blocked = await replayQueue(MARCO);
    expect(blocked.stopped).toBe(true);
    expect(asInes.posts).toEqual([]);

    const asMarco = server([], MARCO);
    await replayQueue(MARCO);
    expect(asMarco.posts.map((p) => p.path)).toEqual(['/api/tools/T-0043/checkout']);
    expect((await waitingOf(INES)).map((a) => a.code)).toEqual(['T-0042']);
  });
});
