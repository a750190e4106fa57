import { beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError, postForBlob, setCsrfToken } from '@/lib/api-client';

beforeEach(() => setCsrfToken(undefined));

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

describe('postForBlob', () => {
  it('answers the file as a Blob, fetching a CSRF token first and retrying once when it is stale', async () => {
    const calls: string[] = [];
    let served = 0;
    vi.stubGlobal(
      'fetch',
      vi.fn((path: string, init: RequestInit = {}) => {
        const token = (init.headers as Record<string, string> | undefined)?.['X-CSRF-Token'] ?? '';
        calls.push(`${init.method ?? 'GET'} ${path} ${token}`);
        if (path === '/api/auth/csrf') return Promise.resolve(json(200, { token: `t${++served}` }));
        if (token === 't1') return Promise.resolve(json(403, { error: { code: 'CSRF_TOKEN_INVALID', message: 'expired' } }));
        return Promise.resolve(new Response(new Blob(['%PDF-1.3']), { status: 200, headers: { 'Content-Type': 'application/pdf' } }));
      }),
    );
    const blob = await postForBlob('/api/labels/sheet', { codes: ['T-0001'] });
    expect(await blob.text()).toBe('%PDF-1.3');
    expect(calls).toEqual(['GET /api/auth/csrf ', 'POST /api/labels/sheet t1', 'GET /api/auth/csrf ', 'POST /api/labels/sheet t2']);
  });

  it('turns the error envelope into an ApiError, and a dropped network into NETWORK', async () => {
    setCsrfToken('t');
    vi.stubGlobal('fetch', vi.fn(() => Promise.resolve(json(400, { error: { code: 'UNKNOWN_CODES', message: 'No tool has the code T-0404.' } }))));
    const err = (await postForBlob('/api/labels/sheet', {}).catch((e: unknown) => e)) as ApiError;
    expect(err).toBeInstanceOf(ApiError);
    expect([err.status, err.code, err.message]).toEqual([400, 'UNKNOWN_CODES', 'No tool has the code T-0404.']);

    vi.stubGlobal('fetch', vi.fn(() => Promise.reject(new TypeError('Failed to fetch'))));
    const offline = (await postForBlob('/api/labels/sheet', {}).catch((e: unknown) => e)) as ApiError;
    expect([offline.status, offline.code]).toEqual([0, 'NETWORK']);
  });
});
