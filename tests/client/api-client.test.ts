import { beforeEach, describe, expect, it, vi } from 'vitest';
import { api, ApiError, isNoConnection, onReachability, setCsrfToken } from '@/lib/api-client';
import { fakeFetch } from '../helpers/render';

beforeEach(() => setCsrfToken(undefined));

describe('api client', () => {
  it('gets a fresh CSRF token and retries once when the server refuses a stale one', async () => {
    setCsrfToken('stale');
    let served = 0;
    const calls = fakeFetch(({ path, headers }) => {
      if (path === '/api/auth/csrf') return { status: 200, body: { token: `fresh-${++served}` } };
      if (headers['X-CSRF-Token'] === 'stale') return { status: 403, body: { error: { code: 'CSRF_TOKEN_INVALID', message: 'expired' } } };
      return { status: 200, body: { ok: true } };
    });
    await expect(api.post('/api/things', { a: 1 })).resolves.toEqual({ ok: true });
    expect(calls.map((c) => `${c.method} ${c.path} ${c.headers['X-CSRF-Token'] ?? ''}`)).toEqual([
      'POST /api/things stale',
      'GET /api/auth/csrf ',
      'POST /api/things fresh-1',
    ]);
  });

  it('turns the error envelope into an ApiError with code, message and issues', async () => {
    fakeFetch(() => ({
      status: 400,
      body: { error: { code: 'VALIDATION_FAILED', message: 'The request body is not valid.', issues: [{ path: 'email', message: 'Bad' }] } },
    }));
    const err = (await api.get('/api/x').catch((e: unknown) => e)) as ApiError;
    expect(err).toBeInstanceOf(ApiError);
    expect(err.status).toBe(400);
    expect(err.code).toBe('VALIDATION_FAILED');
    expect(err.issues).toEqual([{ path: 'email', message: 'Bad' }]);
  });

  it('says there is no connection when fetch itself fails', async () => {
    vi.stubGlobal('fetch', vi.fn(() => Promise.reject(new TypeError('Failed to fetch'))));
    const err = (await api.get('/api/x').catch((e: unknown) => e)) as ApiError;
    expect(err.status).toBe(0);
    expect(err.code).toBe('NETWORK');
    expect(err.message).toMatch(/No connection/);
  });

  it('counts a server that does not answer in time as no connection, and a refusal as an answer', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn((_path: string, init: RequestInit) => new Promise((_resolve, reject) => init.signal?.addEventListener('abort', () => reject(init.signal?.reason)))),
    );
    const heard: boolean[] = [];
    const stop = onReachability((answered) => heard.push(answered));
    const slow = (await api.get('/api/x', { timeoutMs: 20 }).catch((e: unknown) => e)) as ApiError;
    expect(slow.status).toBe(0);
    expect(slow.code).toBe('TIMEOUT');
    expect(isNoConnection(slow)).toBe(true);

    fakeFetch(() => ({ status: 409, body: { error: { code: 'TOOL_ON_LOAN', message: 'Someone has it.' } } }));
    const refused = await api.get('/api/x').catch((e: unknown) => e);
    expect(isNoConnection(refused)).toBe(false);
    stop();
    expect(heard).toEqual([false, true]);
  });

  it('sends the extra headers of one request beside the CSRF token', async () => {
    setCsrfToken('t1');
    const calls = fakeFetch(() => ({ status: 201, body: { ok: true } }));
    await api.post('/api/tools/T-0042/checkout', {}, { headers: { 'Idempotency-Key': 'abcdefgh-1' } });
    await api.post('/api/tools/T-0042/checkout', {});
    expect(calls.map((c) => [c.headers['Idempotency-Key'], c.headers['X-CSRF-Token']])).toEqual([
      ['abcdefgh-1', 't1'],
      [undefined, 't1'],
    ]);
  });
});
