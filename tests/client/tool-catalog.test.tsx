import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { Tool } from '@shared/schemas/tools';
import { ToolCatalog } from '@/features/tools/components/tool-catalog';
import { renderWithProviders } from '../helpers/render';

const tool = (id: number, name: string, category: Tool['category'], location: string, status: Tool['status'] = 'available'): Tool => ({
  id,
  code: `T-${String(id).padStart(4, '0')}`,
  name,
  category,
  location,
  replacementValueCents: 5000,
  loanDays: 14,
  loanDaysOverride: null,
  requiredSignoff: null,
  serviceIntervalDays: null,
  lastServiceAt: null,
  serviceDueAt: null,
  status,
  statusNote: null,
  drillSize: null,
  rivetDiameter32: null,
  traySize: null,
  trayCapacity: null,
  accessories: [],
  notes: '',
  loan: null,
  missingAccessories: [],
  holds: { waiting: 0, offeredTo: null, offerExpiresAt: null },
  photoIds: [],
});

const TOOLS = [
  tool(3, 'Air drill, 90 degree', 'air_drill', 'Cabinet 2'),
  tool(1, 'Hand rivet puller, long handle', 'hand_rivet_puller', 'Wall board A'),
  tool(2, 'Pneumatic rivet puller', 'pneumatic_rivet_puller', 'Cabinet 2', 'on_loan'),
  tool(4, 'Bucking bar, tungsten', 'bucking_bar', ''),
];

const codes = () =>
  screen
    .getAllByRole('row')
    .slice(1)
    .map((r) => within(r).getAllByRole('cell')[0]!.textContent);

describe('ToolCatalog', () => {
  it('opens sorted by code, searches and filters by place from the places the tools name', async () => {
    renderWithProviders(<ToolCatalog tools={TOOLS} />);
    expect(codes()).toEqual(['T-0001', 'T-0002', 'T-0003', 'T-0004']);

    await userEvent.type(screen.getByRole('searchbox', { name: 'Search code or name' }), 'rivet puller');
    expect(codes()).toEqual(['T-0001', 'T-0002']);
    expect(screen.getByText('Showing 2 of 4 tools')).toBeTruthy();

    const place = screen.getByLabelText('Place');
    expect(within(place).getAllByRole('option').map((o) => o.textContent)).toEqual(['Anywhere', 'Cabinet 2', 'Wall board A']);
    await userEvent.selectOptions(place, 'Cabinet 2');
    expect(codes()).toEqual(['T-0002']);
    expect(screen.getByText(/\(1 on\)/)).toBeTruthy();
  });
});
