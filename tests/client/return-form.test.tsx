import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ToolForYou } from '@shared/schemas/tools';
import { ReturnForm } from '@/features/tools/components/return-form';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const tray: ToolForYou = {
  id: 60,
  code: 'T-0060',
  name: 'Temporary fastener tray, 1/8',
  category: 'temporary_fastener_tray',
  location: 'Pin cabinet',
  replacementValueCents: 4500,
  loanDays: 14,
  loanDaysOverride: null,
  requiredSignoff: null,
  serviceIntervalDays: null,
  lastServiceAt: null,
  serviceDueAt: null,
  status: 'on_loan',
  statusNote: null,
  drillSize: null,
  rivetDiameter32: null,
  traySize: '1/8',
  trayCapacity: 50,
  accessories: ['Temporary fastener pliers'],
  notes: '',
  loan: { id: 7, holder: { id: 3, name: 'Marco Bellweather' }, checkedOutAt: '2026-12-01T09:00:00.000Z', dueAt: '2026-12-15T09:00:00.000Z', accessoriesOut: null },
  missingAccessories: [],
  holds: { waiting: 0, offeredTo: null, offerExpiresAt: null },
  photoIds: [],
  forYou: { actions: ['return'], reason: null, defaultDueAt: '2026-12-17T09:00:00.000Z', yourHold: null },
};

afterEach(() => vi.unstubAllGlobals());

describe('returning a temporary fastener tray', () => {
  it('asks for the count when it was cleared, instead of recording every fastener as lost', async () => {
    const calls = fakeFetch(() => ({ status: 200, body: { token: 'csrf' } }));
    renderWithProviders(<ReturnForm tool={tray} />);
    await userEvent.clear(await screen.findByLabelText('Temporary fasteners in the tray now'));
    await userEvent.click(screen.getByRole('button', { name: 'Return T-0060' }));
    expect(await screen.findByText('Count the temporary fasteners that came back.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
  });

  it('sends the count typed, and refuses more than a full tray before sending', async () => {
    const calls = fakeFetch((call) =>
      call.method === 'POST' ? { status: 200, body: { returnedAt: '2026-12-03T10:00:00.000Z', shortfall: 4, accessoriesMissing: [], offeredTo: null } } : { status: 200, body: { token: 'csrf' } },
    );
    renderWithProviders(<ReturnForm tool={tray} />);
    const count = await screen.findByLabelText('Temporary fasteners in the tray now');
    await userEvent.clear(count);
    await userEvent.type(count, '51');
    await userEvent.click(screen.getByRole('button', { name: 'Return T-0060' }));
    expect(await screen.findByText('A full tray holds 50. Count again.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);

    await userEvent.clear(count);
    await userEvent.type(count, '46');
    await userEvent.click(screen.getByRole('button', { name: 'Return T-0060' }));
    await vi.waitFor(() => expect(calls.filter((c) => c.method === 'POST').map((c) => c.body)).toEqual([{ condition: 'ok', returnedCount: 46 }]));
  });
});
