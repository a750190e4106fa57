import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Suspense } from 'react';
import { beforeEach, describe, expect, it } from 'vitest';
import type { PaymentListItem, RefusedCheckout } from '@shared/schemas/payments';
import type { Tab } from '@shared/schemas/stock-money';
import { PaymentsRoute } from '@/app/routes/app/payments';
import { stockMoneyKeys } from '@/features/stock-money/api/keys';
import { TabView } from '@/features/stock-money/components/tab-view';
import { setCsrfToken } from '@/lib/api-client';
import { fakeFetch, renderWithProviders, type FakeCall } from '../helpers/render';

const MIA = { id: 2, name: 'Mia Member' };
const ONLINE: PaymentListItem = {
  id: 7,
  member: MIA,
  amountCents: 1440,
  method: 'online',
  refundedCents: 0,
  refundableCents: 1440,
  at: '2026-12-01T12:00:00.000Z',
  recordedBy: MIA,
  note: 'Paid online',
};
const CASH: PaymentListItem = { ...ONLINE, id: 5, amountCents: 700, method: 'cash', refundableCents: 0, at: '2026-11-20T18:00:00.000Z', recordedBy: { id: 3, name: 'Quinn Quartermaster' }, note: 'at the bench' };
const REFUNDED: PaymentListItem = { ...ONLINE, id: 4, amountCents: 900, refundedCents: 900, refundableCents: 0, at: '2026-11-02T18:00:00.000Z' };

const REFUSED: RefusedCheckout = { id: 9, member: MIA, askedCents: 1440, currency: 'usd', receivedCents: 900, receivedCurrency: 'eur', at: '2026-12-02T15:00:00.000Z', sessionId: 'cs_test_refused' };

type Answer = { status: number; body?: unknown } | undefined;

function renderPaymentsPage(role: 'lead' | 'quartermaster', onRefund: (call: FakeCall) => Answer = () => undefined, path = '/payments', refused: RefusedCheckout[] = []) {
  let payments = [ONLINE, CASH, REFUNDED];
  const calls = fakeFetch((call) => {
    if (call.path === '/api/auth/me') return { status: 200, body: { user: { id: 1, name: 'Lee Lead', email: `${role}@example.org`, role } } };
    if (call.method === 'GET' && call.path === '/api/payments/refused') return { status: 200, body: { data: refused } };
    if (call.method === 'GET' && call.path.startsWith('/api/payments')) return { status: 200, body: { data: payments } };
    if (call.method === 'POST' && call.path === '/api/payments/7/refund') {
      const answer = onRefund(call);
      if (answer?.status === 201) payments = [{ ...ONLINE, refundedCents: 500, refundableCents: 940 }, CASH, REFUNDED];
      return answer;
    }
    return undefined;
  });
  const rendered = renderWithProviders(
    <Suspense fallback={<p>Loading…</p>}>
      <PaymentsRoute />
    </Suspense>,
    path,
  );
  return { calls, ...rendered };
}

const rows = () => within(screen.getByRole('table', { name: 'Payments, newest first' })).getAllByRole('row').slice(1);
const cells = (row: HTMLElement) => within(row).getAllByRole('cell').map((c) => c.textContent);

beforeEach(() => setCsrfToken('tok'));

describe('Payments page', () => {
  it('lists cash and online payments in words, with a Refund action only on online payments with something left', async () => {
    renderPaymentsPage('lead');
    expect(await screen.findByRole('heading', { name: 'Payments', level: 1 })).toBeTruthy();
    const [online, cash, refunded] = rows();
    expect(cells(online!).slice(1, 6)).toEqual(['Mia Member', 'Online', '$14.40', 'None', 'Mia Member']);
    expect(cells(cash!).slice(1, 7)).toEqual(['Mia Member', 'Cash', '$7.00', 'None', 'Quinn Quartermaster', 'at the bench']);
    expect(cells(refunded!)[4]).toBe('$9.00');
    expect(within(online!).getByRole('button', { name: 'Refund Mia Member’s payment of $14.40' })).toBeTruthy();
    expect(within(cash!).queryByRole('button', { name: /Refund/ })).toBeNull();
    expect(within(refunded!).queryByRole('button', { name: /Refund/ })).toBeNull();
  });

  it('shows the checkouts refused above the list, with what was asked and what the provider reported', async () => {
    renderPaymentsPage('quartermaster', undefined, '/payments', [REFUSED]);
    const card = await screen.findByRole('region', { name: 'Checkouts refused' });
    const [item] = within(card).getAllByRole('listitem');
    expect(item!.textContent).toContain('Mia Member');
    expect(item!.textContent).toContain('asked $14.40, the provider reported €9.00');
    expect(within(card).getByText(/refund it in the provider’s dashboard or record the payment by hand/)).toBeTruthy();
    expect(card.compareDocumentPosition(screen.getByRole('table', { name: 'Payments, newest first' })) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
  });

  it('shows no refused card when no checkout was refused', async () => {
    const { calls } = renderPaymentsPage('lead');
    expect(await screen.findByRole('heading', { name: 'Payments', level: 1 })).toBeTruthy();
    expect(calls.some((c) => c.path === '/api/payments/refused')).toBe(true);
    expect(screen.queryByRole('region', { name: 'Checkouts refused' })).toBeNull();
    expect(screen.queryByText(/refused/i)).toBeNull();
  });

  it('offers no refund to the quartermaster', async () => {
    renderPaymentsPage('quartermaster');
    expect(await screen.findByRole('heading', { name: 'Payments', level: 1 })).toBeTruthy();
    expect(screen.queryByRole('button', { name: /^Refund Mia/ })).toBeNull();
    expect(screen.queryByRole('columnheader', { name: 'Refund' })).toBeNull();
  });

  it('links the CSV export to the filters in the address, and fills the filters from it', async () => {
    const { calls } = renderPaymentsPage('lead', undefined, '/payments?from=2026-11-01&to=2026-11-30&method=online');
    expect(await screen.findByRole('heading', { name: 'Payments', level: 1 })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Export CSV' }).getAttribute('href')).toBe('/api/payments/export.csv?from=2026-11-01&to=2026-11-30&method=online');
    expect(calls.find((c) => c.path.startsWith('/api/payments'))?.path).toBe('/api/payments?from=2026-11-01&to=2026-11-30&method=online');
    expect(screen.getByLabelText<HTMLInputElement>('First day').value).toBe('2026-11-01');
    expect(screen.getByLabelText<HTMLSelectElement>('Method').value).toBe('online');
  });

  it('leaves out a filter that does not parse rather than failing the page', async () => {
    const { calls } = renderPaymentsPage('lead', undefined, '/payments?from=someday&method=online');
    expect(await screen.findByRole('heading', { name: 'Payments', level: 1 })).toBeTruthy();
    expect(calls.find((c) => c.path.startsWith('/api/payments'))?.path).toBe('/api/payments?method=online');
  });
});

describe('the refund step', () => {
  it('defaults to the whole remainder, checks dollars and cents, shows the server’s limit, then refunds and refreshes the list and the tabs', async () => {
    let refundAnswer: Answer = { status: 400, body: { error: { code: 'ABOVE_REFUNDABLE', message: 'Only $14.40 of this payment is left to refund.', issues: [{ path: 'amountCents', message: 'At most $14.40.' }] } } };
    const { calls, queryClient } = renderPaymentsPage('lead', () => refundAnswer);
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Refund Mia Member’s payment of $14.40' }));

    const step = screen.getByRole('region', { name: 'Refund $14.40 to Mia Member?' });
    const amount = within(step).getByLabelText<HTMLInputElement>('Amount to refund');
    expect(amount.value).toBe('14.40');

    await user.clear(amount);
    await user.type(amount, '5.5.0');
    await user.click(within(step).getByRole('button', { name: 'Refund' }));
    expect(await within(step).findByText('Enter dollars and cents, like 12.50.')).toBeTruthy();
    await user.clear(amount);
    await user.type(amount, '0');
    await user.click(within(step).getByRole('button', { name: 'Refund' }));
    expect(await within(step).findByText('A refund is more than $0.00.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);

    await user.clear(amount);
    await user.type(amount, '20');
    await user.click(within(step).getByRole('button', { name: 'Refund' }));
    expect(await within(step).findByText('At most $14.40.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST').map((c) => c.body)).toEqual([{ amountCents: 2000 }]);

    // A tab someone has open must be read again after the refund.
    queryClient.setQueryData(stockMoneyKeys.tab(2), { balanceCents: 0 });
    refundAnswer = { status: 201, body: { id: 1, paymentId: 7, amountCents: 500, at: '2026-12-02T12:00:00.000Z', providerRefundId: 're_1', refundedCents: 500, refundableCents: 940 } };
    await user.clear(amount);
    await user.type(amount, '$5');
    await user.click(within(step).getByRole('button', { name: 'Refund' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST').map((c) => c.body)).toEqual([{ amountCents: 2000 }, { amountCents: 500 }]));
    await waitFor(() => expect(screen.queryByRole('region', { name: /Refund/ })).toBeNull());
    await waitFor(() => expect(cells(rows()[0]!)[4]).toBe('$5.00 · $9.40 left'));
    expect(queryClient.getQueryState(stockMoneyKeys.tab(2))?.isInvalidated).toBe(true);
  });

  it('closes without calling the server on Cancel', async () => {
    const { calls } = renderPaymentsPage('lead');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Refund Mia Member’s payment of $14.40' }));
    await user.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('region', { name: /Refund/ })).toBeNull();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });
});

describe('My tab’s payments', () => {
  it('says what was refunded on a payment', () => {
    const tab: Tab = {
      member: MIA,
      chargedCents: 1440,
      paidCents: 940,
      balanceCents: 500,
      byMonth: [{ month: '2026-12', chargedCents: 1440, paidCents: 940 }],
      byAssembly: [],
      recent: [],
      payments: [
        { id: 7, userId: 2, amountCents: 1440, at: ONLINE.at, note: 'Paid online', recordedBy: MIA, method: 'online', refundedCents: 500 },
        { id: 5, userId: 2, amountCents: 700, at: CASH.at, note: 'at the bench', recordedBy: MIA, method: 'cash', refundedCents: 0 },
      ],
    };
    renderWithProviders(<TabView tab={tab} />);
    const payments = screen.getByRole('heading', { name: 'Payments' }).parentElement!;
    const [online, cash] = within(payments).getAllByRole('listitem');
    expect(online!.textContent).toContain('Refunded $5.00');
    expect(cash!.textContent).not.toContain('Refunded');
  });
});
