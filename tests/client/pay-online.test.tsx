import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Suspense } from 'react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { CheckoutStatus, PaymentSettingsView } from '@shared/schemas/payments';
import type { Tab } from '@shared/schemas/stock-money';
import { TabRoute } from '@/app/routes/app/tab';
import { setCsrfToken } from '@/lib/api-client';
import { fakeFetch, renderWithProviders, type FakeCall } from '../helpers/render';

const leaveFor = vi.hoisted(() => vi.fn());
vi.mock('@/features/payments/utils/leave-for', () => ({ leaveFor }));

const OFFERED: PaymentSettingsView = { offered: true, currency: 'usd', minimumCents: 50, provider: 'local-fake' };
const HOSTED = 'http://127.0.0.1:4010/pay/cs_test_abc';
const tabOf = (balanceCents: number): Tab => ({
  member: { id: 2, name: 'Mia Member' },
  chargedCents: balanceCents,
  paidCents: 0,
  balanceCents,
  byMonth: [],
  byAssembly: [],
  recent: [],
  payments: [],
});

function renderTab(balanceCents: number, settings: PaymentSettingsView, path = '/tab', respond?: (call: FakeCall) => { status: number; body?: unknown } | undefined) {
  const calls = fakeFetch((call) => {
    const own = respond?.(call);
    if (own) return own;
    if (call.path === '/api/stock/tab') return { status: 200, body: tabOf(balanceCents) };
    if (call.path === '/api/payments/settings') return { status: 200, body: settings };
    if (call.path === '/api/payments/checkout' && call.method === 'POST') return { status: 201, body: { url: HOSTED } };
    return undefined;
  });
  renderWithProviders(
    <Suspense fallback={<p>Loading…</p>}>
      <TabRoute />
    </Suspense>,
    path,
  );
  return calls;
}

const posts = (calls: FakeCall[]) => calls.filter((c) => c.method === 'POST');

beforeEach(() => {
  setCsrfToken('tok');
  leaveFor.mockReset();
});

describe('Pay online on My tab', () => {
  it('pays the whole balance with one press and sends the browser to the provider’s page', async () => {
    const calls = renderTab(1440, OFFERED);
    await userEvent.click(await screen.findByRole('button', { name: 'Pay $14.40' }));
    await waitFor(() => expect(leaveFor).toHaveBeenCalledWith(HOSTED));
    expect(posts(calls)).toMatchObject([{ path: '/api/payments/checkout', body: {} }]);
  });

  it('checks a part before sending: under the minimum, over the balance, not dollars and cents; then sends it in cents', async () => {
    const calls = renderTab(1440, OFFERED);
    const amount = await screen.findByLabelText('Or pay part of it');
    const pay = screen.getByRole('button', { name: 'Pay this amount' });
    await userEvent.type(amount, '0.49');
    await userEvent.click(pay);
    expect(await screen.findByText('Online payments are at least $0.50.')).toBeTruthy();
    await userEvent.clear(amount);
    await userEvent.type(amount, '14.41');
    await userEvent.click(pay);
    expect(await screen.findByText('You owe $14.40; pay that much or less.')).toBeTruthy();
    await userEvent.clear(amount);
    await userEvent.type(amount, '5.5x');
    await userEvent.click(pay);
    expect(await screen.findByText('Enter dollars and cents, like 12.50.')).toBeTruthy();
    expect(posts(calls)).toHaveLength(0);

    await userEvent.clear(amount);
    await userEvent.type(amount, '$5.50');
    await userEvent.click(pay);
    await waitFor(() => expect(posts(calls)).toMatchObject([{ path: '/api/payments/checkout', body: { amountCents: 550 } }]));
    await waitFor(() => expect(leaveFor).toHaveBeenCalledWith(HOSTED));
  });

  it('shows the server’s refusal and stays on the page', async () => {
    renderTab(1440, OFFERED, '/tab', ({ path }) =>
      path === '/api/payments/checkout'
        ? { status: 502, body: { error: { code: 'PROVIDER_UNAVAILABLE', message: 'The payment provider could not be reached. Try again in a minute, or pay the quartermaster in cash.' } } }
        : undefined,
    );
    await userEvent.click(await screen.findByRole('button', { name: 'Pay $14.40' }));
    expect(await screen.findByText(/The payment provider could not be reached/)).toBeTruthy();
    expect(leaveFor).not.toHaveBeenCalled();
  });

  it('says to pay cash when the balance is under the minimum, with no button', async () => {
    renderTab(36, OFFERED);
    expect(await screen.findByText('Your tab of $0.36 is under the $0.50 online minimum: pay it in cash to the quartermaster.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /^Pay/ })).toBeNull();
  });

  it('says payments are taken in cash when the chapter does not offer online payment', async () => {
    renderTab(1440, { ...OFFERED, offered: false });
    expect(await screen.findByText('The chapter takes payments in cash: pay your tab to the quartermaster.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /^Pay/ })).toBeNull();
  });

  it('asks in the chapter’s currency', async () => {
    renderTab(1440, { ...OFFERED, currency: 'eur' });
    expect(await screen.findByRole('button', { name: 'Pay €14.40' })).toBeTruthy();
  });
});

describe('back from the provider’s page', () => {
  it('says the payment was cancelled and nothing was charged', async () => {
    renderTab(1440, OFFERED, '/tab?payment=cancelled');
    expect((await screen.findByRole('status')).textContent).toBe('Payment cancelled: nothing was charged.');
  });

  it('waits for the provider, then says the payment was received and reloads the tab', async () => {
    let state: CheckoutStatus['state'] = 'open';
    let balance = 1440;
    const calls = renderTab(1440, OFFERED, '/tab?payment=paid&checkout=cs_test_abc', ({ path }) => {
      if (path === '/api/payments/checkouts/cs_test_abc') return { status: 200, body: { state, amountCents: 1440, currency: 'usd' } };
      if (path === '/api/stock/tab') return { status: 200, body: tabOf(balance) };
      return undefined;
    });
    const status = await screen.findByRole('status');
    await waitFor(() => expect(status.textContent).toContain('Still waiting for the provider'));
    expect(status.getAttribute('aria-live')).toBe('polite');
    state = 'paid';
    balance = 0;
    await waitFor(() => expect(status.textContent).toContain('Payment received: $14.40'), { timeout: 4000 });
    await waitFor(() => expect(screen.getByRole('region', { name: 'Balance' }).textContent).toContain('You owe the chapter nothing.'));
    const polls = calls.filter((c) => c.path === '/api/payments/checkouts/cs_test_abc').length;
    await new Promise((r) => setTimeout(r, 1800));
    expect(calls.filter((c) => c.path === '/api/payments/checkouts/cs_test_abc')).toHaveLength(polls);
  });

  it('says an expired checkout charged nothing', async () => {
    renderTab(1440, OFFERED, '/tab?payment=paid&checkout=cs_test_old', ({ path }) =>
      path === '/api/payments/checkouts/cs_test_old' ? { status: 200, body: { state: 'expired', amountCents: 1440, currency: 'usd' } } : undefined,
    );
    await waitFor(() => expect(screen.getByRole('status').textContent).toBe('This checkout expired: nothing was charged'));
  });
});
