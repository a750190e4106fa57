import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Suspense } from 'react';
import { beforeEach, describe, expect, it } from 'vitest';
import type { Tab, TabEntry } from '@shared/schemas/stock-money';
import { TabRoute } from '@/app/routes/app/tab';
import { RecordPaymentForm } from '@/features/stock-money/components/record-payment-form';
import { setCsrfToken } from '@/lib/api-client';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const LEFT_AILERON = { name: 'Left aileron', buildName: 'Two-seat kit' };
const RIGHT_FLAP = { name: 'Right flap', buildName: 'Two-seat kit' };

const entry = (over: Partial<TabEntry>): TabEntry => ({
  id: 1,
  at: '2026-09-10T15:00:00.000Z',
  kind: 'draw',
  binCode: 'B-0001',
  designation: 'Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)',
  quantity: -120,
  unitCost: 0.12,
  chargeCents: 1440,
  assemblyId: 7,
  assembly: LEFT_AILERON,
  note: '',
  ...over,
});

// The server's answer for a member who drew 120 at $0.12 and 10 screws at $0.35 in September,
// 50 at $0.13 in October, had one draw reversed, and paid $10.00.
const TAB: Tab = {
  member: { id: 2, name: 'Mia Member' },
  chargedCents: 2440,
  paidCents: 1000,
  balanceCents: 1440,
  byMonth: [
    { month: '2026-12', chargedCents: 0, paidCents: 1000 },
    { month: '2026-10', chargedCents: 650, paidCents: 0 },
    { month: '2026-09', chargedCents: 1790, paidCents: 0 },
  ],
  byAssembly: [
    { assemblyId: 7, assembly: LEFT_AILERON, quantity: 170, chargedCents: 2090 },
    { assemblyId: null, assembly: null, quantity: 1206, chargedCents: 42210 },
  ],
  recent: [
    entry({ id: 5, kind: 'reversal', at: '2026-11-03T10:00:00.000Z', quantity: 30, unitCost: 0.13, chargeCents: -390, assemblyId: 8, assembly: RIGHT_FLAP, note: 'drawn on the wrong member' }),
    entry({ id: 4, at: '2026-10-28T18:00:00.000Z', quantity: -30, unitCost: 0.13, chargeCents: 390, assemblyId: 8, assembly: RIGHT_FLAP }),
    entry({ id: 3, at: '2026-10-05T09:00:00.000Z', quantity: -50, unitCost: 0.13, chargeCents: 650 }),
    entry({ id: 2, binCode: 'B-0002', designation: 'Screw #8-32 × 1/2 pan head', quantity: -1206, unitCost: 0.35, chargeCents: 42210, assemblyId: null, assembly: null }),
    entry({ id: 1 }),
  ],
  payments: [{ id: 1, userId: 2, amountCents: 1000, at: '2026-12-02T12:00:00.000Z', note: 'cash at the bench', recordedBy: { id: 1, name: 'Lee Lead' }, method: 'cash', refundedCents: 0 }],
};

const EMPTY: Tab = { member: { id: 3, name: 'Nell New' }, chargedCents: 0, paidCents: 0, balanceCents: 0, byMonth: [], byAssembly: [], recent: [], payments: [] };

function renderTabPage(tab: Tab) {
  const calls = fakeFetch(({ path }) => (path === '/api/stock/tab' ? { status: 200, body: tab } : undefined));
  renderWithProviders(
    <Suspense fallback={<p>Loading…</p>}>
      <TabRoute />
    </Suspense>,
  );
  return calls;
}

const tableRows = (caption: string) => within(screen.getByRole('table', { name: caption })).getAllByRole('row').slice(1);
const cellTexts = (row: HTMLElement) => within(row).getAllByRole('cell').map((c) => c.textContent);

beforeEach(() => setCsrfToken('tok'));

describe('My tab page', () => {
  it('shows the balance in words and figures, then the tab by month, by assembly and entry by entry', async () => {
    const calls = renderTabPage(TAB);
    expect(await screen.findByRole('heading', { name: 'My tab' })).toBeTruthy();
    expect(calls.map((c) => c.path)).toEqual(['/api/stock/tab', '/api/payments/settings']);

    const balance = screen.getByRole('region', { name: 'Balance' });
    expect(within(balance).getByText('$14.40')).toBeTruthy();
    expect(within(balance).getByText('You owe the chapter $14.40.')).toBeTruthy();
    expect(within(balance).getByText('$24.40')).toBeTruthy();
    expect(within(balance).getByText('$10.00')).toBeTruthy();

    expect(tableRows('Charged and paid by month').map(cellTexts)).toEqual([
      ['December 2026', '$0.00', '$10.00'],
      ['October 2026', '$6.50', '$0.00'],
      ['September 2026', '$17.90', '$0.00'],
    ]);
    expect(tableRows('Charged by assembly').map(cellTexts)).toEqual([
      ['Left aileron · Two-seat kit', '170', '$20.90'],
      ['Not tied to an assembly', '1,206', '$422.10'],
    ]);

    const recent = tableRows('Recent draws, returns and corrections').map(cellTexts);
    expect(recent).toHaveLength(5);
    expect(recent[0]).toEqual([expect.any(String), expect.stringContaining('B-0001'), 'Correction: drawn on the wrong member', '-30 × $0.13', 'Right flap · Two-seat kit', '-$3.90']);
    expect(recent[4]).toEqual([expect.any(String), expect.stringContaining('B-0001'), 'Drawn', '120 × $0.12', 'Left aileron · Two-seat kit', '$14.40']);
    expect(recent[3]![1]).toContain('Screw #8-32 × 1/2 pan head');
    expect(recent[3]![4]).toBe('Not tied to an assembly');
    expect(recent[3]![3]).toBe('1,206 × $0.35');

    expect(screen.getByText(/cash at the bench/)).toBeTruthy();
  });

  it('says plainly when nothing is owed and nothing was drawn', async () => {
    renderTabPage(EMPTY);
    expect(await screen.findByText('You owe the chapter nothing.')).toBeTruthy();
    expect(screen.getByText('Nothing drawn yet. Scan a bin label to draw stock.')).toBeTruthy();
    expect(screen.getByText('No payments recorded yet.')).toBeTruthy();
  });

  it('says when a member has paid ahead', async () => {
    renderTabPage({ ...EMPTY, paidCents: 500, balanceCents: -500, byMonth: [{ month: '2026-12', chargedCents: 0, paidCents: 500 }] });
    expect(await screen.findByText('You have paid $5.00 ahead.')).toBeTruthy();
  });
});

describe('RecordPaymentForm', () => {
  const payers = [
    { id: 2, name: 'Mia Member' },
    { id: 4, name: 'Otto Other' },
  ];

  it('checks the amount before calling the server, then sends it in cents', async () => {
    const calls = fakeFetch(({ method, path, body }) =>
      method === 'POST' && path === '/api/stock/payments'
        ? { status: 201, body: { id: 9, userId: (body as { userId: number }).userId, amountCents: (body as { amountCents: number }).amountCents, at: '2026-12-02T12:00:00.000Z', note: '', recordedBy: { id: 1, name: 'Lee Lead' } } }
        : undefined,
    );
    renderWithProviders(<RecordPaymentForm payers={payers} />);
    const user = userEvent.setup();
    await user.selectOptions(screen.getByLabelText('Who paid'), 'Otto Other');
    await user.type(screen.getByLabelText('Amount'), '0');
    await user.click(screen.getByRole('button', { name: 'Record payment' }));
    expect(await screen.findByText('A payment is more than $0.00.')).toBeTruthy();
    await user.clear(screen.getByLabelText('Amount'));
    await user.type(screen.getByLabelText('Amount'), '12.5x');
    await user.click(screen.getByRole('button', { name: 'Record payment' }));
    expect(await screen.findByText('Enter dollars and cents, like 12.50.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);

    await user.clear(screen.getByLabelText('Amount'));
    await user.type(screen.getByLabelText('Amount'), '$1,012.50');
    await user.click(screen.getByRole('button', { name: 'Record payment' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ userId: 4, amountCents: 101_250, note: '' }));
  });
});
