import 'fake-indexeddb/auto';
import { beforeEach, describe, expect, it } from 'vitest';
import { forgetOtherCatalogues, readCatalogue, refreshCatalogue } from '@/features/offline/api/catalogue';
import { enqueue, waitingOf } from '@/features/offline/api/queue';
import { forgetOnSignOut } from '@/features/offline/api/sign-out';
import { offlineDb, type QueuedAction } from '@/features/offline/db';
import { offlineBin, offlineTool } from '@/features/offline/utils/offline-state';
import { catalogueFixture, catalogueTool } from '../helpers/catalogue-fixture';
import { fakeFetch } from '../helpers/render';

const MARCO = 7;
const INES = 9;

beforeEach(async () => {
  await offlineDb.catalogues.clear();
  await offlineDb.actions.clear();
});

describe('the catalogue copy', () => {
  it('keeps the signed-in member’s copy and drops anyone else’s', async () => {
    await offlineDb.catalogues.put({ memberId: INES, catalogue: catalogueFixture({ you: { id: INES, name: 'Ines Parra', role: 'member' } }) });
    fakeFetch((call) => (call.path === '/api/offline/catalogue' ? { status: 200, body: catalogueFixture() } : undefined));

    await refreshCatalogue(MARCO);

    expect((await readCatalogue(MARCO))?.catalogue.tools.map((t) => t.code)).toEqual(['T-0042', 'T-0043']);
    expect(await readCatalogue(INES)).toBeUndefined();
  });

  it('keeps nothing when the session answering is another person’s', async () => {
    fakeFetch(() => ({ status: 200, body: catalogueFixture({ you: { id: INES, name: 'Ines Parra', role: 'member' } }) }));
    expect(await refreshCatalogue(MARCO)).toBeUndefined();
    expect(await offlineDb.catalogues.count()).toBe(0);
  });

  it('is forgotten for other people when someone signs in, and entirely on sign-out, where waiting actions stay', async () => {
    await offlineDb.catalogues.bulkPut([
      { memberId: MARCO, catalogue: catalogueFixture() },
      { memberId: INES, catalogue: catalogueFixture() },
    ]);
    await forgetOtherCatalogues(MARCO);
    expect((await offlineDb.catalogues.toArray()).map((c) => c.memberId)).toEqual([MARCO]);
    await enqueue({ memberId: MARCO, kind: 'check_out', code: 'T-0042', what: 'Fan', body: {}, catalogueAt: '2026-12-03T08:00:00.000Z' });
    expect(await forgetOnSignOut(MARCO)).toBe(1);
    expect(await offlineDb.catalogues.count()).toBe(0);
    // What waits is kept for when they sign in again: nothing is dropped.
    expect(await waitingOf(MARCO)).toHaveLength(1);
  });
});

const queued = (over: Partial<QueuedAction>): QueuedAction => ({
  seq: 1,
  key: 'key-0000001',
  memberId: MARCO,
  kind: 'check_out',
  code: 'T-0042',
  what: '',
  body: {},
  performedAt: '2026-12-03T08:05:00.000Z',
  catalogueAt: '2026-12-03T08:00:00.000Z',
  state: 'waiting',
  ...over,
});

describe('what the copy offers', () => {
  it('offers check out of an available tool, and return once the check out waits to send', () => {
    const catalogue = catalogueFixture();
    expect(offlineTool(catalogue, 'T-0042', [])).toMatchObject({ canCheckOut: true, canReturn: false, reason: null });
    expect(offlineTool(catalogue, 'T-0042', [queued({})])).toMatchObject({ canCheckOut: false, canReturn: true, yours: true });
  });

  it('asks to tick back what a waiting check out took, and what the copy says went out with a loan', () => {
    const catalogue = catalogueFixture({ tools: [catalogueTool('T-0042', { accessories: ['Nosepiece 1/8', 'Nosepiece 5/32'] })] });
    expect(offlineTool(catalogue, 'T-0042', [queued({ body: { accessories: ['Nosepiece 5/32'] } })])?.tool.accessoriesOut).toEqual(['Nosepiece 5/32']);
    expect(offlineTool(catalogue, 'T-0042', [queued({ body: {} })])?.tool.accessoriesOut).toBeNull();
    const lent = catalogueFixture({ tools: [catalogueTool('T-0042', { status: 'on_loan', accessoriesOut: ['Nosepiece 1/8'] })], yourLoans: [{ code: 'T-0042', dueAt: '2026-12-17T12:00:00.000Z' }] });
    expect(offlineTool(lent, 'T-0042', [])?.tool.accessoriesOut).toEqual(['Nosepiece 1/8']);
  });

  it('refuses check out without the required sign-off, and of a tool someone else has', () => {
    const catalogue = catalogueFixture({
      tools: [
        catalogueTool('T-0043', { requiredSignoffId: 3, requiredSignoffName: 'Air tools' }),
        catalogueTool('T-0050', { status: 'on_loan', holder: { id: INES, name: 'Ines Parra' }, dueAt: '2026-12-17T12:00:00.000Z' }),
      ],
    });
    expect(offlineTool(catalogue, 'T-0043', [])).toMatchObject({ canCheckOut: false, reason: 'Needs the "Air tools" sign-off, which you do not have yet.' });
    expect(offlineTool({ ...catalogue, yourSignoffs: [3] }, 'T-0043', [])?.canCheckOut).toBe(true);
    const lent = offlineTool(catalogue, 'T-0050', []);
    expect(lent).toMatchObject({ canCheckOut: false, canReturn: false });
    // The server's words for a loan (the tool page and the checkout refusal say the same).
    expect(lent?.reason).toMatch(/^Ines Parra has it( until|; it was due) Thursday, December 17/);
  });

  it('offers return of the member’s own loan', () => {
    const catalogue = catalogueFixture({
      tools: [catalogueTool('T-0042', { status: 'on_loan', holder: { id: MARCO, name: 'Marco Bellweather' } })],
      yourLoans: [{ code: 'T-0042', dueAt: '2026-12-17T12:00:00.000Z' }],
    });
    expect(offlineTool(catalogue, 'T-0042', [])).toMatchObject({ canReturn: true, canCheckOut: false });
    expect(offlineTool(catalogue, 'T-0042', [queued({ kind: 'return', body: { condition: 'ok' } })])).toMatchObject({ canReturn: false, canCheckOut: true });
  });

  it('counts waiting draws and returns against the bin’s stock and what the member may return', () => {
    const catalogue = catalogueFixture();
    const state = offlineBin(catalogue, 'B-0107', [
      queued({ kind: 'draw', code: 'B-0107', body: { quantity: 50 } }),
      queued({ seq: 2, kind: 'return_unused', code: 'B-0107', body: { quantity: 10 } }),
    ]);
    expect(state).toMatchObject({ onHand: 80, drawnByYou: 40 });
    expect(offlineBin(catalogue, 'B-9999', [])).toBeUndefined();
  });
});
