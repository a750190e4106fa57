import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Loan, ToolForYou } from '@shared/schemas/tools';
import { CheckoutForm } from '@/features/tools/components/checkout-form';
import { OpenLoanList, LoanHistoryList } from '@/features/tools/components/loan-list';
import { MissingAccessories } from '@/features/tools/components/missing-accessories';
import { ReturnForm } from '@/features/tools/components/return-form';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const NOSEPIECES = ['Nosepiece 3/32', 'Nosepiece 1/8', 'Nosepiece 5/32'];

const puller = (over: Partial<ToolForYou> = {}): ToolForYou => ({
  id: 12,
  code: 'T-0012',
  name: 'Hand rivet puller',
  category: 'hand_rivet_puller',
  location: 'Cabinet A',
  replacementValueCents: 5400,
  loanDays: 14,
  loanDaysOverride: null,
  requiredSignoff: null,
  serviceIntervalDays: null,
  lastServiceAt: null,
  serviceDueAt: null,
  status: 'available',
  statusNote: null,
  drillSize: null,
  rivetDiameter32: null,
  traySize: null,
  trayCapacity: null,
  accessories: NOSEPIECES,
  notes: '',
  loan: null,
  missingAccessories: [],
  holds: { waiting: 0, offeredTo: null, offerExpiresAt: null },
  photoIds: [],
  forYou: { actions: ['check_out'], reason: null, defaultDueAt: '2026-12-17T09:00:00.000Z', yourHold: null },
  ...over,
});

const posts = (calls: ReturnType<typeof fakeFetch>) => calls.filter((c) => c.method === 'POST');

afterEach(() => vi.unstubAllGlobals());

describe('checking out with accessories', () => {
  it('sends the accessories ticked, and leaves a missing one off the checklist', async () => {
    const calls = fakeFetch((call) => (call.method === 'POST' ? { status: 201, body: { id: 1, code: 'T-0012', dueAt: '2026-12-17T09:00:00.000Z', accessories: ['Nosepiece 1/8'] } } : { status: 200, body: { token: 'csrf' } }));
    const tool = puller({ missingAccessories: [{ accessory: 'Nosepiece 3/32', reportedAt: '2026-11-30T10:00:00.000Z', lastHolder: { id: 4, name: 'Ines Parra' } }] });
    renderWithProviders(<CheckoutForm tool={tool} />);
    expect(screen.queryByRole('checkbox', { name: 'Nosepiece 3/32' })).toBeNull();
    expect(screen.getByText('Missing from the crib: Nosepiece 3/32.')).toBeTruthy();
    await userEvent.click(screen.getByRole('checkbox', { name: 'Nosepiece 1/8' }));
    await userEvent.click(screen.getByRole('button', { name: 'Check out T-0012' }));
    await vi.waitFor(() => expect(posts(calls).map((c) => c.body)).toEqual([{ accessories: ['Nosepiece 1/8'] }]));
  });
});

describe('returning with accessories', () => {
  it('lists what went out, each to tick back, and sends what was ticked', async () => {
    const calls = fakeFetch((call) =>
      call.method === 'POST' ? { status: 200, body: { status: 'available', shortfall: null, accessoriesMissing: ['Nosepiece 5/32'], offeredTo: null } } : { status: 200, body: { token: 'csrf' } },
    );
    const tool = puller({
      status: 'on_loan',
      loan: { id: 9, holder: { id: 3, name: 'Marco Bellweather' }, checkedOutAt: '2026-12-01T09:00:00.000Z', dueAt: '2026-12-15T09:00:00.000Z', accessoriesOut: ['Nosepiece 1/8', 'Nosepiece 5/32'] },
      forYou: { actions: ['return'], reason: null, defaultDueAt: '2026-12-17T09:00:00.000Z', yourHold: null },
    });
    renderWithProviders(<ReturnForm tool={tool} />);
    const group = screen.getByRole('group', { name: 'Tick what came back with it' });
    expect([...group.querySelectorAll('label')].map((l) => l.textContent)).toEqual(['Nosepiece 1/8', 'Nosepiece 5/32']);
    expect(screen.getByText('Anything not ticked is recorded as missing, for the quartermaster.')).toBeTruthy();
    await userEvent.click(screen.getByRole('checkbox', { name: 'Nosepiece 1/8' }));
    await userEvent.click(screen.getByRole('button', { name: 'Return T-0012' }));
    await vi.waitFor(() => expect(posts(calls).map((c) => c.body)).toEqual([{ condition: 'ok', accessoriesBack: ['Nosepiece 1/8'] }]));
  });

  it('asks nothing about accessories when none were recorded going out', async () => {
    const calls = fakeFetch((call) => (call.method === 'POST' ? { status: 200, body: { status: 'available', shortfall: null, accessoriesMissing: [], offeredTo: null } } : { status: 200, body: { token: 'csrf' } }));
    const tool = puller({ status: 'on_loan', loan: { id: 9, holder: { id: 3, name: 'Marco' }, checkedOutAt: '2026-12-01T09:00:00.000Z', dueAt: '2026-12-15T09:00:00.000Z', accessoriesOut: null } });
    renderWithProviders(<ReturnForm tool={tool} />);
    expect(screen.queryByRole('group', { name: 'Tick what came back with it' })).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Return T-0012' }));
    await vi.waitFor(() => expect(posts(calls).map((c) => c.body)).toEqual([{ condition: 'ok' }]));
  });
});

describe('My loans', () => {
  const loan = (over: Partial<Loan>): Loan => ({
    id: 9,
    tool: { id: 12, code: 'T-0012', name: 'Hand rivet puller', category: 'hand_rivet_puller', accessories: NOSEPIECES },
    holder: { id: 3, name: 'Marco' },
    checkedOutAt: '2026-12-01T09:00:00.000Z',
    dueAt: '2026-12-15T09:00:00.000Z',
    returnedAt: null,
    returnCondition: null,
    returnNote: null,
    returnedCount: null,
    shortfall: null,
    returnPhotoId: null,
    accessoriesOut: ['Nosepiece 1/8'],
    accessoriesMissing: [],
    ...over,
  });

  it('shows what actually went out, not every accessory of the tool, and what did not come back', () => {
    renderWithProviders(
      <>
        <OpenLoanList loans={[loan({})]} empty="None" />
        <LoanHistoryList loans={[loan({ id: 10, returnedAt: '2026-12-02T09:00:00.000Z', returnCondition: 'ok', accessoriesMissing: ['Nosepiece 1/8'] })]} />
      </>,
    );
    expect(screen.getByText('With: Nosepiece 1/8')).toBeTruthy();
    expect(screen.queryByText(/Nosepiece 3\/32/)).toBeNull();
    expect(screen.getByText(/did not come back: Nosepiece 1\/8/)).toBeTruthy();
  });
});

describe('missing accessories on the tool page', () => {
  const tool = puller({ missingAccessories: [{ accessory: 'Nosepiece 5/32', reportedAt: '2026-12-02T09:00:00.000Z', lastHolder: { id: 3, name: 'Marco Bellweather' } }] });

  it('says what is missing and from whom; the quartermaster marks it found', async () => {
    const calls = fakeFetch((call) => (call.method === 'POST' ? { status: 200, body: { data: [] } } : { status: 200, body: { token: 'csrf' } }));
    renderWithProviders(<MissingAccessories tool={tool} canResolve />);
    expect(screen.getByRole('heading', { name: 'Missing accessories' })).toBeTruthy();
    expect(screen.getByText(/did not come back from Marco Bellweather/)).toBeTruthy();
    await userEvent.click(screen.getByRole('button', { name: 'Nosepiece 5/32 found' }));
    await vi.waitFor(() =>
      expect(posts(calls).map((c) => [c.path, c.body])).toEqual([['/api/tools/T-0012/missing-accessories/resolve', { accessory: 'Nosepiece 5/32', resolution: 'found' }]]),
    );
  });

  it('offers members no buttons', () => {
    fakeFetch(() => ({ status: 200, body: { token: 'csrf' } }));
    renderWithProviders(<MissingAccessories tool={tool} canResolve={false} />);
    expect(screen.queryByRole('button')).toBeNull();
  });
});
