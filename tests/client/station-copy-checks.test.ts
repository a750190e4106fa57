import 'fake-indexeddb/auto';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { enqueue, type NewQueuedAction } from '@/features/offline/api/queue';
import { badgeHashOf, holderOf } from '@/features/offline/api/station-sign-in';
import { stationWaitingOf } from '@/features/offline/api/station-queue';
import { replayStationQueue, stopStationReplay } from '@/features/offline/api/station-replay';
import { offlineDb, type QueuedAction } from '@/features/offline/db';
import { catalogueFor } from '@/features/offline/utils/catalogue-for';
import { setCsrfToken } from '@/lib/api-client';
import { catalogueTool } from '../helpers/catalogue-fixture';
import { copyPerson, stationCopyFixture } from '../helpers/station-copy-fixture';

const MARCO_BADGE = 'Qm7xL2pV9cTz4RkW8nYb1HsD6fJq3GaE5uXo0iNwKtM';

describe('the badge check against the copy', () => {
  it('hashes with SHA-256 as published', async () => {
    // NIST FIPS 180-2, Appendix B.1: SHA-256("abc").
    expect(await badgeHashOf('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('finds a badge by the hash the server keeps, and no other', async () => {
    const marco = await copyPerson(3, 'Marco Bellweather', MARCO_BADGE, null);
    const copy = stationCopyFixture([marco]);
    expect((await holderOf(copy, MARCO_BADGE))?.name).toBe('Marco Bellweather');
    expect(await holderOf(copy, MARCO_BADGE.toLowerCase())).toBeUndefined();
  });
});

describe('a person’s catalogue composed from the station’s copy', () => {
  it('has their loans, sign-offs, assemblies and what they drew from each bin', async () => {
    const marco = await copyPerson(3, 'Marco Bellweather', MARCO_BADGE, null, {
      loans: [{ code: 'T-0042', dueAt: '2026-12-17T12:00:00.000Z' }],
      signoffs: [3],
      assemblies: [{ id: 8, name: 'Left elevator', buildName: 'Larkspur two-seater' }],
      drawn: { 'B-0107': 12 },
    });
    const copy = stationCopyFixture([marco]);
    const catalogue = catalogueFor(copy, 3)!;
    expect(catalogue.you).toEqual({ id: 3, name: 'Marco Bellweather', role: 'member' });
    expect(catalogue.yourLoans).toEqual([{ code: 'T-0042', dueAt: '2026-12-17T12:00:00.000Z' }]);
    expect(catalogue.yourSignoffs).toEqual([3]);
    expect(catalogue.yourAssemblies.map((a) => a.name)).toEqual(['Left elevator']);
    expect(catalogue.bins.map((b) => [b.code, b.drawnByYou])).toEqual([['B-0107', 12]]);
    expect(catalogue.takenAt).toBe(copy.takenAt);
    expect(catalogueFor(copy, 99)).toBeUndefined();
  });

  it('moves tools and bins on by what other people did at the station and has not been sent', async () => {
    const marco = await copyPerson(3, 'Marco Bellweather', MARCO_BADGE, null);
    const copy = stationCopyFixture([marco], { tools: [catalogueTool('T-0042'), catalogueTool('T-0050', { status: 'on_loan', holder: { id: 5, name: 'Ines Okafor' } })] });
    const mark = { stationId: 4, badge: 'x'.repeat(43), personName: 'Ines Okafor' };
    const waiting = [
      { memberId: 5, kind: 'check_out', code: 'T-0042', body: {}, station: mark },
      { memberId: 5, kind: 'return', code: 'T-0050', body: { condition: 'ok' }, station: mark },
      { memberId: 5, kind: 'draw', code: 'B-0107', body: { quantity: 20 }, station: mark },
      // Marco's own: the offline views apply those themselves.
      { memberId: 3, kind: 'draw', code: 'B-0107', body: { quantity: 7 }, station: mark },
    ] as QueuedAction[];
    const catalogue = catalogueFor(copy, 3, waiting)!;
    expect(catalogue.tools.find((t) => t.code === 'T-0042')).toMatchObject({ status: 'on_loan', holder: { id: 5, name: 'Ines Okafor' } });
    expect(catalogue.tools.find((t) => t.code === 'T-0050')).toMatchObject({ status: 'available', holder: null });
    expect(catalogue.bins[0]?.onHand).toBe(100);
  });
});

describe('a badge scanned while the station sends its queue', () => {
  beforeEach(async () => {
    setCsrfToken('token-1');
    await offlineDb.actions.clear();
  });

  it('stops the replay after the entry being sent, which ends its session before the badge goes on', async () => {
    const mark = { stationId: 4, badge: MARCO_BADGE, personName: 'Marco Bellweather' };
    const entry = (code: string): NewQueuedAction => ({ memberId: 3, kind: 'check_out', code, what: 'Fan', body: {}, catalogueAt: '2026-12-03T08:00:00.000Z', station: mark });
    await enqueue(entry('T-0042'));
    await enqueue(entry('T-0043'));
    const order: string[] = [];
    let release: () => void = () => {};
    const held = new Promise<void>((resolve) => (release = resolve));
    let sending: () => void = () => {};
    const sendingNow = new Promise<void>((resolve) => (sending = resolve));
    vi.stubGlobal(
      'fetch',
      vi.fn(async (path: string) => {
        order.push(path);
        if (path === '/api/tools/T-0042/checkout') {
          sending();
          await held;
        }
        return new Response(JSON.stringify({ token: 'token-1' }), { status: 200, headers: { 'Content-Type': 'application/json' } });
      }),
    );
    const endSession = vi.fn(() => {
      order.push('end session');
      return Promise.resolve();
    });

    const replay = replayStationQueue(4, endSession);
    await sendingNow;
    const stopped = stopStationReplay().then(() => order.push('badge goes on'));
    release();
    await stopped;

    expect(await replay).toMatchObject({ sent: 1, stopped: true });
    expect(order.filter((p) => p !== '/api/auth/csrf')).toEqual(['/api/station/replay-sign-in', '/api/tools/T-0042/checkout', 'end session', 'badge goes on']);
    expect((await stationWaitingOf(4)).map((a) => a.code)).toEqual(['T-0043']);
  });
});
