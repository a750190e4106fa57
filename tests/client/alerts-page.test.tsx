import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Suspense } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Alert, PurchaseList } from '@shared/schemas/forecast';
import { AlertsRoute } from '@/app/routes/app/alerts';
import { setCsrfToken } from '@/lib/api-client';
import { alertFixture, binBrief } from '../helpers/forecast-fixture';
import { fakeFetch, renderWithProviders, type FakeCall } from '../helpers/render';

const SCREWS = binBrief('B-0002', {
  designation: 'Screw #8-32 × 1/2 pan head',
  kind: 'screw',
  supplier: 'Cedar Hollow Aircraft Parts',
  supplierPart: 'CH-832-8',
  packSize: 100,
  unitCost: 0.3,
  onHand: 20,
  leadTimeDays: 10,
});
const SOLID = binBrief('B-0003', { designation: 'MS20470AD4-6', kind: 'solid_rivet', supplierPart: 'PAS-470-4-6', packSize: 100, unitCost: 0.03, leadTimeDays: 14 });

const ACTIVE: Alert[] = [
  alertFixture(1, { raisedAt: '2027-01-03T07:00:00.000Z' }),
  alertFixture(2, { bin: SCREWS, raisedAt: '2027-01-04T07:00:00.000Z', reason: 'Projected to fall below safety stock (12) in week 2, inside the 10-day lead time', onHandAtRaise: 20, reorderPoint: 30, safetyStock: 12, suggestedQty: 500 }),
  alertFixture(3, {
    state: 'ordered',
    bin: SOLID,
    suggestedQty: 500,
    orderedAt: '2026-12-28T16:00:00.000Z',
    orderedBy: { id: 3, name: 'Quinn Quartermaster' },
    orderedQty: 300,
    receivedQty: 100,
    onOrder: 200,
    toOrder: 0,
    expectedAt: '2027-01-11',
  }),
];
const CLOSED: Alert[] = [alertFixture(4, { state: 'closed', bin: SOLID, orderedAt: '2026-11-02T10:00:00.000Z', orderedQty: 500, receivedQty: 500, toOrder: 0, expectedAt: '2026-11-16', closedAt: '2026-11-15T10:00:00.000Z' })];

// Quantities in whole packs at each bin's unit cost: 2,000 × $0.08 = $160.00, 500 × $0.03 = $15.00, 500 × $0.30 = $150.00.
const PURCHASE: PurchaseList = {
  data: [
    { supplier: 'Cedar Hollow Aircraft Parts', lines: [{ alertId: 2, bin: SCREWS, quantity: 500, packs: 5, costCents: 15000, onOrder: 0 }], totalCents: 15000 },
    {
      supplier: 'Prairie Aero Supply',
      lines: [
        { alertId: 1, bin: binBrief('B-0001'), quantity: 2000, packs: 8, costCents: 16000, onOrder: 0 },
        { alertId: 5, bin: SOLID, quantity: 500, packs: 5, costCents: 1500, onOrder: 0 },
      ],
      totalCents: 17500,
    },
  ],
};

function renderAlerts(respond?: (call: FakeCall) => { status: number; body?: unknown } | undefined) {
  const calls = fakeFetch((call) => {
    const own = respond?.(call);
    if (own) return own;
    if (call.path === '/api/alerts?state=active') return { status: 200, body: { data: ACTIVE } };
    if (call.path === '/api/alerts?state=closed') return { status: 200, body: { data: CLOSED } };
    if (call.path === '/api/alerts/purchase-list') return { status: 200, body: PURCHASE };
    return undefined;
  });
  renderWithProviders(
    <Suspense fallback={<p>Loading…</p>}>
      <AlertsRoute />
    </Suspense>,
    '/alerts',
  );
  return calls;
}

const alertCard = (code: string) => screen.getByRole('article', { name: new RegExp(`^${code} `) });
const figures = (el: HTMLElement) => Object.fromEntries([...el.querySelectorAll('dt')].map((dt) => [dt.textContent, dt.nextElementSibling?.textContent]));
const codesIn = (region: HTMLElement) => within(region).getAllByRole('article').map((a) => within(a).getAllByRole('link')[0]!.textContent);

beforeEach(() => setCsrfToken('tok'));
afterEach(() => vi.useRealTimers());

describe('Alerts page', () => {
  it('lists alerts to order first, newest first, then those on order, each state in words', async () => {
    renderAlerts();
    expect(await screen.findByRole('heading', { name: 'Reorder alerts', level: 1 })).toBeTruthy();
    const toOrder = screen.getByRole('region', { name: 'To order' });
    const ordered = screen.getByRole('region', { name: 'Ordered' });
    expect(toOrder.compareDocumentPosition(ordered) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(codesIn(toOrder)).toEqual(['B-0002', 'B-0001']);
    expect(codesIn(ordered)).toEqual(['B-0003']);

    const b1 = alertCard('B-0001');
    expect(within(b1).getByText('To order')).toBeTruthy();
    expect(within(b1).getByRole('link', { name: 'B-0001' }).getAttribute('href')).toBe('/bins/B-0001');
    expect(figures(b1)).toEqual({
      'On hand when raised': '140 each',
      'Reorder point': '155 each',
      'Safety stock': '35 each',
      'Order now': '2,000 each8 packs of 250',
    });
    expect(within(b1).getByText('On hand 140 is at or below the reorder point 155.')).toBeTruthy();
    expect(within(b1).getByText('Prairie Aero Supply')).toBeTruthy();
    expect(within(b1).getByText('PAS-B42')).toBeTruthy();

    const b3 = alertCard('B-0003');
    expect(within(b3).getByText('Ordered')).toBeTruthy();
    expect(within(b3).getByText('Ordered 300 each on Dec 28, 2026 by Quinn Quartermaster, expected by Jan 11, 2027. 100 each received so far, 200 each still to come.')).toBeTruthy();
    expect(figures(b3)['On order']).toBe('200 each');
    expect(within(b3).queryByRole('button', { name: 'Mark ordered' })).toBeNull();
    // The rest of a partly received order can be closed by hand.
    expect(within(b3).getByRole('button', { name: 'Close order for B-0003: the rest will not come' })).toBeTruthy();
    // An order that fell through may still be dismissed.
    expect(within(b3).getByRole('button', { name: 'Dismiss' })).toBeTruthy();
  });

  it('marks an alert ordered with the suggested quantity and today plus the lead time prefilled', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date(2027, 0, 4, 9, 30));
    const calls = renderAlerts(({ method, path }) =>
      method === 'POST' && path === '/api/alerts/1/ordered' ? { status: 200, body: { ...ACTIVE[0], state: 'ordered' } } : undefined,
    );
    await screen.findByRole('heading', { name: 'Reorder alerts', level: 1 });
    await userEvent.click(within(alertCard('B-0001')).getByRole('button', { name: 'Mark ordered' }));
    const form = screen.getByRole('form', { name: 'Mark B-0001 ordered' });
    const quantity = within(form).getByRole<HTMLInputElement>('spinbutton', { name: 'Quantity ordered (each)' });
    expect(quantity.value).toBe('2000');
    expect(within(form).getByText('That is 8 packs of 250.')).toBeTruthy();
    // Jan 4 + the 21-day lead time
    expect(within(form).getByLabelText<HTMLInputElement>('Expected by').value).toBe('2027-01-25');

    await userEvent.clear(quantity);
    await userEvent.type(quantity, '1750');
    expect(within(form).getByText('That is 7 packs of 250.')).toBeTruthy();
    await userEvent.click(within(form).getByRole('button', { name: 'Save order' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST')).toBe(true));
    const post = calls.find((c) => c.method === 'POST')!;
    expect(post.path).toBe('/api/alerts/1/ordered');
    expect(post.body).toEqual({ quantity: 1750, expectedAt: '2027-01-25' });
    // The lists are fetched again so the alert moves to "Ordered".
    await waitFor(() => expect(calls.filter((c) => c.path === '/api/alerts?state=active')).toHaveLength(2));
    await waitFor(() => expect(screen.queryByRole('form', { name: 'Mark B-0001 ordered' })).toBeNull());
  });

  it('refuses an order of nothing before asking the server', async () => {
    const calls = renderAlerts();
    await screen.findByRole('heading', { name: 'Reorder alerts', level: 1 });
    await userEvent.click(within(alertCard('B-0002')).getByRole('button', { name: 'Mark ordered' }));
    const form = screen.getByRole('form', { name: 'Mark B-0002 ordered' });
    await userEvent.clear(within(form).getByRole('spinbutton', { name: 'Quantity ordered (each)' }));
    await userEvent.click(within(form).getByRole('button', { name: 'Save order' }));
    expect(await within(form).findByText('Enter how many were ordered.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
  });

  it('asks for a reason before dismissing, then sends it', async () => {
    const calls = renderAlerts(({ method, path }) =>
      method === 'POST' && path === '/api/alerts/2/dismiss' ? { status: 200, body: { ...ACTIVE[1], state: 'dismissed' } } : undefined,
    );
    await screen.findByRole('heading', { name: 'Reorder alerts', level: 1 });
    await userEvent.click(within(alertCard('B-0002')).getByRole('button', { name: 'Dismiss' }));
    const form = screen.getByRole('form', { name: 'Dismiss the alert for B-0002' });
    await userEvent.click(within(form).getByRole('button', { name: 'Dismiss alert' }));
    expect(await within(form).findByText('Say why the alert is dismissed.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);

    await userEvent.type(within(form).getByRole('textbox', { name: 'Why dismiss it?' }), 'Bin being merged into B-0012');
    await userEvent.click(within(form).getByRole('button', { name: 'Dismiss alert' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'POST')).toMatchObject({ path: '/api/alerts/2/dismiss', body: { reason: 'Bin being merged into B-0012' } });
  });

  it('offers Order more on an order that does not cover what the rule asks for, prefilled with the rest', async () => {
    const short = { ...ACTIVE[2]!, toOrder: 300 };
    const calls = renderAlerts(({ method, path }) => {
      if (method === 'GET' && path === '/api/alerts?state=active') return { status: 200, body: { data: [ACTIVE[0], ACTIVE[1], short] } };
      if (method === 'POST' && path === '/api/alerts/3/ordered') return { status: 200, body: { ...short, orderedQty: 600, onOrder: 500, toOrder: 0 } };
      return undefined;
    });
    await screen.findByRole('heading', { name: 'Reorder alerts', level: 1 });
    expect(within(alertCard('B-0001')).queryByRole('button', { name: /^Order more/ })).toBeNull();
    await userEvent.click(within(alertCard('B-0003')).getByRole('button', { name: 'Order more for B-0003: 300 each on top of what is on order' }));
    const form = screen.getByRole('form', { name: 'Mark B-0003 ordered' });
    expect(within(form).getByRole<HTMLInputElement>('spinbutton', { name: 'Quantity ordered (each)' }).value).toBe('300');
    await userEvent.click(within(form).getByRole('button', { name: 'Save order' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')).toMatchObject({ path: '/api/alerts/3/ordered', body: { quantity: 300 } }));
  });

  it('closes a partly received order by hand and says nothing more is on order', async () => {
    const calls = renderAlerts(({ method, path }) =>
      method === 'POST' && path === '/api/alerts/3/close' ? { status: 200, body: { ...ACTIVE[2], state: 'closed', onOrder: 0, closedAt: '2027-01-05T10:00:00.000Z' } } : undefined,
    );
    await screen.findByRole('heading', { name: 'Reorder alerts', level: 1 });
    await userEvent.click(within(alertCard('B-0003')).getByRole('button', { name: 'Close order for B-0003: the rest will not come' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'POST')).toMatchObject({ path: '/api/alerts/3/close' });
  });

  it('shows the server’s refusal on the form', async () => {
    renderAlerts(({ method, path }) =>
      method === 'POST' && path === '/api/alerts/2/dismiss'
        ? { status: 409, body: { error: { code: 'ALERT_NOT_OPEN', message: 'This alert was already ordered; refresh the page.' } } }
        : undefined,
    );
    await screen.findByRole('heading', { name: 'Reorder alerts', level: 1 });
    await userEvent.click(within(alertCard('B-0002')).getByRole('button', { name: 'Dismiss' }));
    const form = screen.getByRole('form', { name: 'Dismiss the alert for B-0002' });
    await userEvent.type(within(form).getByRole('textbox', { name: 'Why dismiss it?' }), 'Found a full box');
    await userEvent.click(within(form).getByRole('button', { name: 'Dismiss alert' }));
    expect(await within(form).findByText('This alert was already ordered; refresh the page.')).toBeTruthy();
  });

  it('checks every bin now and fetches the alerts again', async () => {
    const calls = renderAlerts(({ method, path }) =>
      method === 'POST' && path === '/api/alerts/refresh' ? { status: 200, body: { raised: 1, data: ACTIVE } } : undefined,
    );
    await screen.findByRole('heading', { name: 'Reorder alerts', level: 1 });
    await userEvent.click(screen.getByRole('button', { name: 'Check now' }));
    await waitFor(() => expect(calls.filter((c) => c.path === '/api/alerts/purchase-list')).toHaveLength(2));
    expect(calls.filter((c) => c.method === 'POST').map((c) => c.path)).toEqual(['/api/alerts/refresh']);
  });

  it('filters to received alerts', async () => {
    const calls = renderAlerts();
    await screen.findByRole('heading', { name: 'Reorder alerts', level: 1 });
    await userEvent.selectOptions(screen.getByRole('combobox', { name: 'Show' }), 'Closed');
    const received = await screen.findByRole('region', { name: 'Closed' });
    expect(calls.map((c) => c.path)).toContain('/api/alerts?state=closed');
    expect(codesIn(received)).toEqual(['B-0003']);
    expect(within(received).getByText('Ordered 500 each on Nov 2, 2026, expected by Nov 16, 2026. Received on Nov 15, 2026.')).toBeTruthy();
    expect(screen.queryByRole('region', { name: 'To order' })).toBeNull();
    expect(within(received).queryByRole('button')).toBeNull();
  });

  it('groups the purchase list by supplier with each total and the whole, and offers it as CSV', async () => {
    renderAlerts();
    await screen.findByRole('heading', { name: 'Reorder alerts', level: 1 });
    const list = screen.getByRole('region', { name: 'Purchase list' });
    const prairie = within(list).getByRole('region', { name: 'Prairie Aero Supply' });
    // 16000 + 1500 cents
    expect(within(prairie).getByText('$175.00')).toBeTruthy();
    expect(within(prairie).getByText(/^2 lines · total/)).toBeTruthy();
    const solid = within(prairie).getAllByRole('listitem').find((li) => li.textContent?.includes('B-0003'))!;
    expect(within(solid).getByText('500 each')).toBeTruthy();
    expect(within(solid).getByText('5 packs of 100')).toBeTruthy();
    expect(within(solid).getByText('$15.00')).toBeTruthy();
    const cedar = within(list).getByRole('region', { name: 'Cedar Hollow Aircraft Parts' });
    expect(within(cedar).getAllByText('$150.00')).toHaveLength(2);
    // 17500 + 15000 cents
    expect(within(list).getByText(/^3 lines from 2 suppliers, estimated total/).textContent).toContain('$325.00');
    expect(within(list).getByRole('link', { name: 'Download CSV' }).getAttribute('href')).toBe('/api/alerts/purchase-list.csv');
  });

  it('says when nothing waits to be ordered', async () => {
    renderAlerts(({ path }) =>
      path === '/api/alerts?state=active' ? { status: 200, body: { data: [] } } : path === '/api/alerts/purchase-list' ? { status: 200, body: { data: [] } } : undefined,
    );
    expect(await screen.findByText(/No alert is waiting/)).toBeTruthy();
    expect(screen.getByText('Nothing to order: no alert is waiting to be ordered.')).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Download CSV' })).toBeNull();
  });
});
