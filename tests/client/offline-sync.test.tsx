import 'fake-indexeddb/auto';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, waitFor } from '@testing-library/react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { enqueue, waitingOf } from '@/features/offline/api/queue';
import { OfflineSync } from '@/features/offline/components/offline-sync';
import { offlineDb, type QueuedAction } from '@/features/offline/db';
import { setCsrfToken } from '@/lib/api-client';
import { catalogueFixture } from '../helpers/catalogue-fixture';
import { fakeFetch } from '../helpers/render';

const MARCO = 7;
const INES = 9;

function serve() {
  return fakeFetch((call) => {
    if (call.path === '/api/auth/me') return { status: 200, body: { user: { id: MARCO, name: 'Marco Bellweather', email: 'member@example.org', role: 'member' } } };
    if (call.path === '/api/offline/catalogue') return { status: 200, body: catalogueFixture() };
    if (call.method === 'POST') return { status: 201, body: {} };
    return undefined;
  });
}

function renderSync(onSettled: (entry: QueuedAction) => void) {
  return render(
    <QueryClientProvider client={new QueryClient()}>
      <OfflineSync memberId={MARCO} onSettled={onSettled} />
    </QueryClientProvider>,
  );
}

beforeEach(async () => {
  setCsrfToken('token-1');
  await offlineDb.actions.clear();
  await offlineDb.catalogues.clear();
});

describe('keeping the phone in step', () => {
  it('on start, sends the waiting actions, tells what was sent, takes a fresh copy and forgets other people’s', async () => {
    await offlineDb.catalogues.put({ memberId: INES, catalogue: catalogueFixture({ you: { id: INES, name: 'Ines Parra', role: 'member' } }) });
    await enqueue({ memberId: MARCO, kind: 'check_out', code: 'T-0042', what: 'Fan', body: {}, catalogueAt: '2026-12-03T08:00:00.000Z' });
    const calls = serve();
    const settled: string[] = [];
    renderSync((entry) => settled.push(`${entry.kind} ${entry.code}`));

    await waitFor(() => expect(settled).toEqual(['check_out T-0042']));
    await waitFor(async () => expect((await offlineDb.catalogues.toArray()).map((c) => c.memberId)).toEqual([MARCO]));
    expect(await waitingOf(MARCO)).toEqual([]);
    expect(calls.filter((c) => c.method === 'POST').map((c) => c.path)).toEqual(['/api/tools/T-0042/checkout']);
  });

  it('sends what was queued offline when the browser says it is back online', async () => {
    const onLine = vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(false);
    const calls = serve();
    renderSync(() => {});
    await enqueue({ memberId: MARCO, kind: 'draw', code: 'B-0107', what: 'Rivets', body: { quantity: 5 }, catalogueAt: '2026-12-03T08:00:00.000Z' });
    await new Promise((r) => setTimeout(r, 50));
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);

    onLine.mockReturnValue(true);
    window.dispatchEvent(new Event('online'));

    await waitFor(async () => expect(await waitingOf(MARCO)).toEqual([]));
    expect(calls.filter((c) => c.method === 'POST').map((c) => c.path)).toEqual(['/api/bins/B-0107/draw']);
  });
});
