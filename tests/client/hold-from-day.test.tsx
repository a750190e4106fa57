import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ToolForYou } from '@shared/schemas/tools';
import { ToolActionsPanel } from '@/features/tools/components/tool-actions-panel';
import { formatDate } from '@/lib/format';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const bar: ToolForYou = {
  id: 21,
  code: 'T-0021',
  name: 'Bucking bar, steel',
  category: 'bucking_bar',
  location: 'Bar rack',
  replacementValueCents: 3500,
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
  traySize: null,
  trayCapacity: null,
  accessories: [],
  notes: '',
  loan: { id: 4, holder: { id: 9, name: 'Ines Parra' }, checkedOutAt: '2026-12-01T09:00:00.000Z', dueAt: '2026-12-15T09:00:00.000Z', accessoriesOut: null },
  missingAccessories: [],
  holds: { waiting: 1, offeredTo: null, offerExpiresAt: null },
  photoIds: [],
  forYou: {
    actions: ['cancel_hold'],
    reason: 'Ines Parra has it until Tuesday, December 15.',
    defaultDueAt: '2026-12-17T09:00:00.000Z',
    yourHold: { status: 'waiting', position: 1, offerExpiresAt: null, startsAt: '2027-01-05T07:00:00.000Z' },
  },
};

afterEach(() => vi.unstubAllGlobals());

describe('a hold placed ahead for an assembly', () => {
  it('says the day it starts rather than a place in the queue', () => {
    fakeFetch(() => ({ status: 200, body: { token: 'csrf' } }));
    renderWithProviders(<ToolActionsPanel tool={bar} />);
    expect(screen.getByText(`Your hold starts on ${formatDate('2027-01-05T07:00:00.000Z')}, the planned start of your assembly: it is set aside for you then, or when it comes back after that. We e-mail you.`)).toBeTruthy();
    expect(screen.queryByText(/number 1 in the queue/)).toBeNull();
  });
});
