import 'fake-indexeddb/auto';
import { QueryClient } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Outlet } from 'react-router';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { requireSignedIn } from '@/app/routes/app/guards';
import { QueueRoute } from '@/app/routes/app/queue';
import { ToolDetailRoute, toolDetailLoader } from '@/app/routes/app/tool-detail';
import { BinDetailRoute, binDetailLoader } from '@/app/routes/app/bin-detail';
import { authKeys } from '@/features/auth/api/keys';
import { enqueue, markRefused, waitingOf } from '@/features/offline/api/queue';
import { OfflineBanner } from '@/features/offline/components/offline-banner';
import { offlineDb } from '@/features/offline/db';
import { catalogueFixture, catalogueTool } from '../helpers/catalogue-fixture';
import { renderRoutes } from '../helpers/render';

const MARCO = { id: 7, name: 'Marco Bellweather', email: 'member@example.org', role: 'member' as const };
const TEN_MIN_AGO = () => new Date(Date.now() - 10 * 60_000).toISOString();

function renderOffline(path: string) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  queryClient.setQueryData(authKeys.me(), MARCO);
  return renderRoutes(
    queryClient,
    [
      {
        path: '/',
        element: (
          <>
            <OfflineBanner memberId={MARCO.id} />
            <Outlet />
          </>
        ),
        children: [
          { path: 'tools/:code', loader: toolDetailLoader(queryClient), Component: ToolDetailRoute },
          { path: 'bins/:code', loader: binDetailLoader(queryClient), Component: BinDetailRoute },
          { path: 'queue', Component: QueueRoute },
        ],
      },
    ],
    path,
  );
}

let fetchSpy: ReturnType<typeof vi.fn>;

beforeEach(async () => {
  await offlineDb.actions.clear();
  await offlineDb.catalogues.clear();
  await offlineDb.catalogues.put({ memberId: MARCO.id, catalogue: catalogueFixture({ takenAt: TEN_MIN_AGO() }) });
  vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(false);
  fetchSpy = vi.fn(() => Promise.reject(new TypeError('Failed to fetch')));
  vi.stubGlobal('fetch', fetchSpy);
});
afterEach(() => {
  vi.restoreAllMocks();
});

describe('a scanned tool with no connection', () => {
  it('opens from the offline copy, says how old it is, and queues the check out', async () => {
    renderOffline('/tools/T-0042');
    expect(await screen.findByRole('heading', { name: 'Rivet spacing fan, 10 hole' })).toBeTruthy();
    expect(screen.getByText('Offline copy from 10 min ago')).toBeTruthy();
    expect(screen.getByText(/^— scans use the copy from 10 min ago; check out, return and draw will be sent when the connection is back/)).toBeTruthy();

    await userEvent.click(screen.getByRole('button', { name: 'Check out T-0042' }));

    expect(await screen.findByRole('link', { name: '1 action waiting to send' })).toBeTruthy();
    const [entry] = await waitingOf(MARCO.id);
    expect(entry).toMatchObject({ kind: 'check_out', code: 'T-0042', memberId: MARCO.id, body: {}, state: 'waiting' });
    expect(entry?.key).toMatch(/^[0-9a-f-]{36}$/);
    expect(await screen.findByRole('button', { name: 'Return T-0042' })).toBeTruthy();
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it('queues the check out with the accessories ticked, and asks for them back at return', async () => {
    await offlineDb.catalogues.put({
      memberId: MARCO.id,
      catalogue: catalogueFixture({ takenAt: TEN_MIN_AGO(), tools: [catalogueTool('T-0042', { name: 'Hand rivet puller', accessories: ['Nosepiece 1/8', 'Nosepiece 5/32'] })] }),
    });
    renderOffline('/tools/T-0042');
    await userEvent.click(await screen.findByRole('checkbox', { name: 'Nosepiece 5/32' }));
    await userEvent.click(screen.getByRole('button', { name: 'Check out T-0042' }));
    expect(await screen.findByRole('group', { name: 'Tick what came back with it' })).toBeTruthy();
    const [entry] = await waitingOf(MARCO.id);
    expect(entry).toMatchObject({ kind: 'check_out', body: { accessories: ['Nosepiece 5/32'] } });
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it('offers no check out without the sign-off, and says what needs a connection', async () => {
    renderOffline('/tools/T-0043');
    expect(await screen.findByText('Needs the "Air tools" sign-off, which you do not have yet.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Check out/ })).toBeNull();
    expect(screen.getByText(/holds, photos, the tool's history/)).toBeTruthy();
  });

  it('queues the return of the member’s own tray with its condition, note and count', async () => {
    await offlineDb.catalogues.put({
      memberId: MARCO.id,
      catalogue: catalogueFixture({
        takenAt: TEN_MIN_AGO(),
        tools: [catalogueTool('T-0060', { name: 'Temporary fastener tray, 1/8', category: 'temporary_fastener_tray', status: 'on_loan', holder: { id: MARCO.id, name: MARCO.name }, traySize: '1/8', trayCapacity: 50 })],
        yourLoans: [{ code: 'T-0060', dueAt: '2026-12-17T12:00:00.000Z' }],
      }),
    });
    renderOffline('/tools/T-0060');
    await userEvent.click(await screen.findByRole('radio', { name: 'Needs attention' }));
    await userEvent.click(screen.getByRole('button', { name: 'Return T-0060' }));
    expect(await screen.findByText('Say what needs attention, so the quartermaster knows what to look at.')).toBeTruthy();

    await userEvent.type(screen.getByLabelText('What needs attention?'), 'Two pins bent');
    await userEvent.clear(screen.getByLabelText('Temporary fasteners in the tray now'));
    await userEvent.type(screen.getByLabelText('Temporary fasteners in the tray now'), '46');
    await userEvent.click(screen.getByRole('button', { name: 'Return T-0060' }));
    await waitFor(async () =>
      expect((await waitingOf(MARCO.id)).map((a) => [a.kind, a.body])).toEqual([['return', { condition: 'needs_attention', note: 'Two pins bent', returnedCount: 46 }]]),
    );
  });

  it('says so when the code is not in the copy', async () => {
    renderOffline('/tools/T-0999');
    expect(await screen.findByText('T-0999 is not in the offline copy')).toBeTruthy();
  });
});

describe('a scanned bin with no connection', () => {
  it('queues a draw for one of the member’s assemblies, within what the copy shows on hand', async () => {
    renderOffline('/bins/B-0107');
    const quantity = await screen.findByLabelText('Quantity to draw');
    await userEvent.type(quantity, '500');
    await userEvent.click(screen.getByRole('button', { name: 'Draw from B-0107' }));
    expect(await screen.findByText(/The copy shows 120 each in B-0107/)).toBeTruthy();
    expect(await waitingOf(MARCO.id)).toEqual([]);

    await userEvent.clear(quantity);
    await userEvent.type(quantity, '50');
    await userEvent.selectOptions(screen.getByLabelText('For which assembly (optional)'), 'Left elevator · Larkspur two-seater');
    await userEvent.click(screen.getByRole('button', { name: 'Draw from B-0107' }));
    await waitFor(async () => expect((await waitingOf(MARCO.id)).map((a) => a.body)).toEqual([{ quantity: 50, assemblyId: 8 }]));
    expect(await screen.findByText('70 each on hand by the copy.')).toBeTruthy();
  });
});

describe('the Waiting to send page', () => {
  it('lists waiting actions in order and refusals with the reason and what to do', async () => {
    await enqueue({ memberId: MARCO.id, kind: 'draw', code: 'B-0107', what: '1/8 dome', body: { quantity: 50 }, catalogueAt: TEN_MIN_AGO() });
    const refused = await enqueue({ memberId: MARCO.id, kind: 'check_out', code: 'T-0042', what: 'Fan', body: {}, catalogueAt: TEN_MIN_AGO() });
    await markRefused(refused.seq, { status: 409, code: 'TOOL_ON_LOAN', message: 'T-0042 is on loan: held by Ines Parra until 2026-12-17.', nextStep: 'Someone else has the tool.', at: TEN_MIN_AGO() });
    renderOffline('/queue');

    const waiting = (await screen.findByRole('heading', { name: 'Waiting to send (1)' })).closest('section')!;
    expect(within(waiting).getByText('Draw 50 from B-0107')).toBeTruthy();
    const notSent = screen.getByRole('heading', { name: 'Not sent (1)' }).closest('section')!;
    expect(within(notSent).getByText('T-0042 is on loan: held by Ines Parra until 2026-12-17.')).toBeTruthy();
    expect(screen.getByRole('link', { name: '1 not sent — see why' })).toBeTruthy();

    await userEvent.click(within(notSent).getByRole('button', { name: 'Dismiss Check out T-0042' }));
    expect(await screen.findByText('Gripline has refused nothing.')).toBeTruthy();
    expect(screen.queryByRole('link', { name: /not sent/ })).toBeNull();
  });
});

describe('opening the app with no network', () => {
  it('takes the owner of the phone’s offline copy as signed in', async () => {
    const queryClient = new QueryClient();
    const me = await requireSignedIn(queryClient, new Request('http://localhost/scan'));
    expect(me).toMatchObject({ id: MARCO.id, name: MARCO.name, role: 'member' });
    expect(fetchSpy).not.toHaveBeenCalled();
  });
});
