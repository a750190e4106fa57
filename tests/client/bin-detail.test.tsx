import { QueryClient } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import type { BinForYou, BinReorder, LedgerEntry } from '@shared/schemas/bins';
import { BinDetailRoute, binDetailLoader } from '@/app/routes/app/bin-detail';
import { ScanRoute } from '@/app/routes/app/scan';
import { authKeys } from '@/features/auth/api/keys';
import { setCsrfToken } from '@/lib/api-client';
import { assemblyFixture } from '../helpers/assembly-fixture';
import { binFixture, ledgerEntryFixture } from '../helpers/bin-fixture';
import { fakeFetch, renderRoutes, testQueryClient, type FakeCall } from '../helpers/render';

type Role = 'member' | 'quartermaster';
const PEOPLE = { member: { id: 2, name: 'Ruth Lindqvist' }, quartermaster: { id: 3, name: 'Marco Bellweather' } };

/** A 1/8 in structural dome blind rivet, grip −2; 120 on hand at $0.13 each. */
function binFor(role: Role, over: Partial<BinForYou['forYou']> = {}, onHand = 120): BinForYou {
  const actions: BinForYou['forYou']['actions'] = role === 'quartermaster' ? ['draw', 'receive', 'count', 'move', 'write_off'] : ['draw'];
  return {
    ...binFixture('B-0107', {
      kind: 'blind_structural',
      head: 'dome',
      material: '5056',
      stemMaterial: 'steel',
      diameter32: 4,
      grip16: 2,
      unitCost: 0.13,
      packSize: 100,
      onHand,
      reorderPoint: 50,
      supplierPart: 'BR-4-2-D',
      location: 'Cabinet R, drawer 3',
    }),
    forYou: { actions, yourNetDrawn: 0, sameSpecBins: role === 'quartermaster' ? [{ code: 'B-0108', location: 'Overflow shelf', onHand: 400 }] : [], ...over },
  };
}

const entry = (over: Partial<LedgerEntry> & Pick<LedgerEntry, 'id' | 'kind' | 'quantity' | 'balanceAfter'>): LedgerEntry => ledgerEntryFixture(PEOPLE.quartermaster, over);

/** Newest first, as the server sends it. */
const LEDGER: LedgerEntry[] = [
  entry({ id: 12, kind: 'reversal', quantity: 20, balanceAfter: 120, reversesId: 11, note: 'Drawn on the wrong bin' }),
  entry({ id: 11, kind: 'draw', quantity: -20, balanceAfter: 100, actor: PEOPLE.member, member: PEOPLE.member, reversedById: 12, assemblyId: 8, assembly: { name: 'Left aileron', buildName: 'Two-seat kit' } }),
  entry({ id: 10, kind: 'count', quantity: 0, balanceAfter: 120 }),
  entry({ id: 9, kind: 'receive', quantity: 120, balanceAfter: 120, slipId: 3, note: 'Order 2291' }),
];

/** The member's own assemblies: one planned, one in progress, one done. */
const MY_ASSEMBLIES = [
  assemblyFixture(7, { name: 'Rudder', status: 'planned' }),
  assemblyFixture(8, { name: 'Left elevator', status: 'in_progress' }),
  assemblyFixture(9, { name: 'Vertical stabiliser', status: 'done' }),
];

/**
 * A small fake of the bins API: GET answers the current bin, and a successful movement changes
 * its on hand, so the page is seen to refresh. `answer` may take over a POST.
 */
function serve(role: Role, opts: { bin?: BinForYou; reorder?: BinReorder; ledger?: LedgerEntry[]; answer?: (call: FakeCall) => { status: number; body?: unknown } | undefined } = {}) {
  let bin = opts.bin ?? binFor(role);
  const calls = fakeFetch((call) => {
    if (call.path === '/api/auth/me') return { status: 200, body: { user: { ...PEOPLE[role], email: `${role}@example.org`, role } } };
    if (call.method === 'GET' && call.path === '/api/bins/B-0107') return { status: 200, body: bin };
    if (call.method === 'GET' && call.path === '/api/bins/B-0107/reorder') return { status: 200, body: opts.reorder ?? { low: false, toOrder: 0, onOrder: 0, reorderAt: 50, orderCostCents: 0 } };
    if (call.method === 'GET' && call.path === '/api/bins/B-0107/ledger') return { status: 200, body: { data: opts.ledger ?? LEDGER } };
    if (call.method === 'GET' && call.path === '/api/assemblies?mine=true') return { status: 200, body: { data: MY_ASSEMBLIES } };
    if (call.method !== 'POST') return undefined;
    const taken = opts.answer?.(call);
    if (taken) return taken;
    const body = call.body as { quantity?: number; counted?: number };
    if (call.path === '/api/bins/B-0107/count') {
      const variance = body.counted! - bin.onHand;
      bin = { ...bin, onHand: body.counted! };
      return { status: 201, body: { ...entry({ id: 20, kind: 'count', quantity: variance, balanceAfter: bin.onHand }), counted: body.counted, onHandBefore: bin.onHand - variance, variance, varianceValueCents: variance * 13 } };
    }
    if (call.path === '/api/bins/B-0107/receive') {
      bin = { ...bin, onHand: bin.onHand + body.quantity! };
      return { status: 201, body: entry({ id: 21, kind: 'receive', quantity: body.quantity!, balanceAfter: bin.onHand }) };
    }
    if (call.path === '/api/bins/B-0107/draw') {
      bin = { ...bin, onHand: bin.onHand - body.quantity! };
      return { status: 201, body: entry({ id: 22, kind: 'draw', quantity: -body.quantity!, balanceAfter: bin.onHand }) };
    }
    return undefined;
  });
  return calls;
}

function renderBinPage() {
  const queryClient = testQueryClient();
  renderRoutes(queryClient, [{ path: '/bins/:code', loader: binDetailLoader(queryClient), Component: BinDetailRoute, HydrateFallback: () => null }], '/bins/B-0107');
  return screen.findByRole('heading', { level: 1 });
}

const posts = (calls: FakeCall[]) => calls.filter((c) => c.method === 'POST');
const onHand = () => screen.getByTestId('bin-on-hand').textContent;

beforeEach(() => setCsrfToken('tok'));

describe('the bin page', () => {
  it('shows a member the bin with its grip range, and Draw with its value before confirming, but no quartermaster action', async () => {
    serve('member');
    const heading = await renderBinPage();
    // Grip −2 covers 0.063–0.125 in: TM 10-5410-221-14/1 Table 4-3 (see reference/trade-checks.md).
    expect(heading.textContent).toMatch(/^Blind, structural, dome, 5056.* · 1\/8 in · grip −2 \(0\.063–0\.125 in\)$/);
    expect(onHand()).toBe('120');
    expect(screen.getByText('Cabinet R, drawer 3')).toBeTruthy();
    expect(screen.queryByText(/BR-4-2-D/)).toBeNull();

    expect(screen.getByRole('button', { name: 'Draw from B-0107' })).toBeTruthy();
    for (const other of ['Receive', 'Count', 'Move', 'Write off']) expect(screen.queryByRole('radio', { name: other })).toBeNull();
    expect(screen.queryByRole('button', { name: /^Receive/ })).toBeNull();
    expect(screen.queryByLabelText('Counted quantity')).toBeNull();

    await userEvent.type(screen.getByLabelText('Quantity to draw'), '50');
    // 50 × $0.13 = $6.50 (arithmetic).
    expect(screen.getByText(/Goes on your tab/).textContent).toContain('$6.50');
    // Members see the ledger but neither reverse entries nor open packing slips.
    expect(await screen.findByText('Order 2291')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /^Reverse entry/ })).toBeNull();
    expect(screen.queryByRole('link', { name: 'Packing slip' })).toBeNull();
  });

  it('values a draw at a fraction of a cent as the ledger does: half a cent rounds up', async () => {
    serve('member', { bin: { ...binFor('member'), unitCost: 0.0825 } });
    await renderBinPage();
    await userEvent.type(screen.getByLabelText('Quantity to draw'), '50');
    // 50 × $0.0825 = $4.125, rounded half away from zero to $4.13 (arithmetic).
    expect(screen.getByText(/Goes on your tab/).textContent).toContain('$4.13');
  });

  it('warns while typing when the quantity is more than the bin holds, and sends nothing', async () => {
    const calls = serve('member');
    await renderBinPage();
    await userEvent.type(screen.getByLabelText('Quantity to draw'), '500');
    const warning = 'Only 120 each on hand in B-0107: draw 120 or fewer, or ask the quartermaster.';
    expect(screen.getByText(warning)).toBeTruthy();
    expect(screen.queryByText(/Goes on your tab/)).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Draw from B-0107' }));
    expect(screen.getAllByText(warning).length).toBeGreaterThan(0);
    expect(posts(calls)).toHaveLength(0);
    await userEvent.clear(screen.getByLabelText('Quantity to draw'));
    await userEvent.type(screen.getByLabelText('Quantity to draw'), '120');
    expect(screen.queryByText(warning)).toBeNull();
  });

  it('shows the server’s sentence when the bin was drawn down meanwhile', async () => {
    const message = 'You cannot draw 100 from B-0107: only 20 on hand.';
    const calls = serve('member', { answer: () => ({ status: 409, body: { error: { code: 'INSUFFICIENT_STOCK', message } } }) });
    await renderBinPage();
    await userEvent.type(screen.getByLabelText('Quantity to draw'), '100');
    await userEvent.click(screen.getByRole('button', { name: 'Draw from B-0107' }));
    expect((await screen.findByRole('alert')).textContent).toContain(message);
    expect(posts(calls)[0]).toMatchObject({ path: '/api/bins/B-0107/draw', body: { quantity: 100 } });
    expect(onHand()).toBe('120');
  });

  it('draws, sends no empty note, and shows the new on hand at once', async () => {
    const calls = serve('member');
    await renderBinPage();
    await userEvent.click(screen.getByRole('button', { name: '1 more' }));
    await userEvent.click(screen.getByRole('button', { name: '1 more' }));
    await userEvent.click(screen.getByRole('button', { name: 'Draw from B-0107' }));
    await waitFor(() => expect(onHand()).toBe('118'));
    expect(posts(calls)[0]!.body).toEqual({ quantity: 2 });
  });

  it('names one of the member’s open assemblies on a draw when chosen', async () => {
    const calls = serve('member');
    await renderBinPage();
    const picker = await screen.findByLabelText('For which assembly (optional)');
    expect(within(picker).getAllByRole('option').map((o) => o.textContent)).toEqual(['Not for an assembly', 'Rudder · Two-seat low wing', 'Left elevator · Two-seat low wing']);
    await userEvent.selectOptions(picker, 'Left elevator · Two-seat low wing');
    await userEvent.type(screen.getByLabelText('Quantity to draw'), '12');
    await userEvent.click(screen.getByRole('button', { name: 'Draw from B-0107' }));
    await waitFor(() => expect(posts(calls)[0]?.body).toEqual({ quantity: 12, assemblyId: 8 }));
  });

  it('offers Return unused up to what the member drew, and refuses more before calling the server', async () => {
    const calls = serve('member', { bin: binFor('member', { actions: ['draw', 'return_unused'], yourNetDrawn: 30 }) });
    await renderBinPage();
    await userEvent.click(screen.getByRole('radio', { name: 'Return unused' }));
    await userEvent.type(screen.getByLabelText('Quantity to return'), '31');
    await userEvent.click(screen.getByRole('button', { name: 'Return to B-0107' }));
    expect((await screen.findByText(/You can return at most 30 each/)).textContent).toBeTruthy();
    expect(posts(calls)).toHaveLength(0);
  });

  it('shows the quartermaster the count adjustment and its value before saving, then posts the count', async () => {
    const calls = serve('quartermaster');
    await renderBinPage();
    expect(screen.getByText(/BR-4-2-D/)).toBeTruthy();
    await userEvent.click(screen.getByRole('radio', { name: 'Count' }));
    await userEvent.type(screen.getByLabelText('Counted quantity'), '115');
    // 115 − 120 = −5; −5 × $0.13 = −$0.65 (arithmetic).
    expect(screen.getByText('Adjustment −5 (−$0.65)')).toBeTruthy();
    expect(posts(calls)).toHaveLength(0);
    await userEvent.click(screen.getByRole('button', { name: 'Save count' }));
    await waitFor(() => expect(onHand()).toBe('115'));
    expect(posts(calls)).toEqual([expect.objectContaining({ path: '/api/bins/B-0107/count', body: { counted: 115 } })]);
  });

  it('receives whole packs as packs × pack size, with the unit cost and the uploaded packing slip', async () => {
    const calls = serve('quartermaster', {
      answer: (call) => (call.path === '/api/bins/slips' ? { status: 201, body: { id: 3, contentType: 'application/pdf', filename: 'slip-2291.pdf', size: 9 } } : undefined),
    });
    await renderBinPage();
    await userEvent.click(screen.getByRole('radio', { name: 'Receive' }));
    const slipInput = screen.getByLabelText('Packing slip (optional)');
    expect(slipInput.getAttribute('accept')).toBe('application/pdf,image/*');
    await userEvent.upload(slipInput, new File(['%PDF-1.4'], 'slip-2291.pdf', { type: 'application/pdf' }));
    expect(await screen.findByText('Packing slip attached: slip-2291.pdf')).toBeTruthy();

    await userEvent.click(screen.getByRole('radio', { name: 'In packs of 100' }));
    await userEvent.type(screen.getByLabelText('Packs received'), '3');
    expect(screen.getByText('That is 300 each.')).toBeTruthy();
    expect(screen.getByLabelText<HTMLInputElement>('Unit cost (dollars)').value).toBe('0.13');
    await userEvent.click(screen.getByRole('button', { name: 'Receive into B-0107' }));
    await waitFor(() => expect(onHand()).toBe('420'));
    const [upload, receive] = posts(calls);
    expect(upload!.path).toBe('/api/bins/slips');
    expect(receive).toMatchObject({ path: '/api/bins/B-0107/receive', body: { quantity: 300, unitCost: 0.13, slipId: 3 } });
  });

  it('moves only to a bin the server lists as the same spec', async () => {
    serve('quartermaster');
    await renderBinPage();
    await userEvent.click(screen.getByRole('radio', { name: 'Move' }));
    const options = within(screen.getByLabelText('Move to bin')).getAllByRole('option').map((o) => o.textContent);
    expect(options).toEqual(['B-0108 · Overflow shelf · 400 on hand']);
  });

  it('asks for a reason before writing stock off', async () => {
    const calls = serve('quartermaster');
    await renderBinPage();
    await userEvent.click(screen.getByRole('radio', { name: 'Write off' }));
    await userEvent.type(screen.getByLabelText('Quantity to write off'), '4');
    await userEvent.click(screen.getByRole('button', { name: 'Write off the stock' }));
    expect(await screen.findByText(/Say why the stock is written off/)).toBeTruthy();
    expect(posts(calls)).toHaveLength(0);
  });
});

describe('what to order, on the bin page', () => {
  it('shows the quartermaster the one reorder rule’s quantity and what is already on order', async () => {
    serve('quartermaster', { bin: binFor('quartermaster', {}, 40), reorder: { low: true, toOrder: 300, onOrder: 200, reorderAt: 260, orderCostCents: 3900 } });
    await renderBinPage();
    expect((await screen.findByTestId('bin-on-order')).textContent).toBe('200 each on order');
    const notice = await screen.findByText(/^Only 40 each left/);
    expect(notice.textContent).toBe(
      'Only 40 each left, with 200 each on order, at or below the reorder point of 260 or short of what planned work needs. Order 300 each (3 packs of 100) from Prairie Aero Supply.',
    );
    // The point in force, and the bin's own when planned work raises it.
    expect(screen.getByText(/planned work raises the bin’s own 50|planned work raises the bin's own 50/)).toBeTruthy();
  });
});

describe('the ledger on the bin page', () => {
  it('links a reversal and the entry it reverses, and shows signed quantities and balances', async () => {
    serve('member');
    await renderBinPage();
    const reverses = await screen.findByRole('link', { name: 'reverses #11' });
    expect(reverses.getAttribute('href')).toBe('#entry-11');
    expect(screen.getByRole('link', { name: 'reversed by #12' }).getAttribute('href')).toBe('#entry-12');
    const draw = document.getElementById('entry-11')!;
    expect(draw.textContent).toContain('Drawn −20');
    expect(draw.textContent).toContain('balance 100 · −$2.60');
    // A draw for an assembly names it and its build; an entry for none says nothing of one.
    expect(draw.textContent).toContain('for Left aileron · Two-seat kit');
    expect(document.getElementById('entry-9')!.textContent).not.toContain(' for ');
  });

  it('shows a member another person’s entry as the server masks it: what moved, without a name or a value', async () => {
    const other = entry({ id: 13, kind: 'draw', quantity: -25, balanceAfter: 95, masked: true, actor: null, member: null, unitCost: null, valueCents: null });
    serve('member', { ledger: [other, ...LEDGER] });
    await renderBinPage();
    await screen.findByRole('link', { name: 'reverses #11' });
    const text = document.getElementById('entry-13')!.textContent;
    expect(text).toContain('Drawn −25');
    expect(text).toContain('balance 95');
    expect(text).toContain('another person');
    expect(text).not.toContain('$');
    expect(text).not.toContain(' at ');
  });

  it('lets the quartermaster reverse only entries that can be, with a reason', async () => {
    const calls = serve('quartermaster', {
      answer: (call) => (call.path.endsWith('/reverse') ? { status: 201, body: entry({ id: 13, kind: 'reversal', quantity: -120, balanceAfter: 0, reversesId: 9 }) } : undefined),
    });
    await renderBinPage();
    await screen.findByText('Order 2291');
    // Not a reversal, not one already reversed, not a count that changed nothing.
    expect(screen.getAllByRole('button', { name: /^Reverse entry/ }).map((b) => b.getAttribute('aria-label'))).toEqual(['Reverse entry #9']);
    expect(screen.getByRole('link', { name: 'Packing slip' }).getAttribute('href')).toBe('/api/bins/slips/3');

    await userEvent.click(screen.getByRole('button', { name: 'Reverse entry #9' }));
    const confirm = screen.getByRole('button', { name: 'Reverse #9' });
    expect((confirm as HTMLButtonElement).disabled).toBe(true);
    await userEvent.type(screen.getByLabelText('Why reverse entry #9?'), 'Booked on the wrong bin');
    await userEvent.click(confirm);
    await waitFor(() => expect(posts(calls)).toEqual([expect.objectContaining({ path: '/api/bins/B-0107/ledger/9/reverse', body: { note: 'Booked on the wrong bin' } })]));
  });
});

describe('the Scan screen', () => {
  function renderScan() {
    // Signed out here: the Scan screen reads who is signed in only to say whether an offline copy is kept.
    const queryClient = new QueryClient();
    queryClient.setQueryData(authKeys.me(), null);
    return renderRoutes(
      queryClient,
      [
        { path: '/scan', Component: ScanRoute },
        { path: '/bins/:code', element: <p>bin page</p> },
        { path: '/tools/:code', element: <p>tool page</p> },
      ],
      '/scan',
    );
  }

  it('opens a typed bin code on its bin page', async () => {
    const router = renderScan();
    await userEvent.type(screen.getByLabelText('Or type the code on the label'), 'b-0107{Enter}');
    expect(await screen.findByText('bin page')).toBeTruthy();
    expect(router.state.location.pathname).toBe('/bins/B-0107');
  });

  it('still opens tool codes, and names both kinds of code when a label is not ours', async () => {
    const router = renderScan();
    await userEvent.type(screen.getByLabelText('Or type the code on the label'), 'X-12{Enter}');
    expect(screen.getByText(/Tool codes look like T-0042, bin codes like B-0107/)).toBeTruthy();
    await userEvent.type(screen.getByLabelText('Or type the code on the label'), 'T-0042{Enter}');
    expect(await screen.findByText('tool page')).toBeTruthy();
    expect(router.state.location.pathname).toBe('/tools/T-0042');
  });
});
