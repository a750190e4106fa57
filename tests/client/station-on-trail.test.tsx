import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { LedgerEntry } from '@shared/schemas/bins';
import type { ToolEvent } from '@shared/schemas/tools';
import { LedgerList } from '@/features/stock/components/ledger-list';
import { ToolHistory } from '@/features/tools/components/tool-history';
import { ledgerEntryFixture } from '../helpers/bin-fixture';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const MEMBER = { id: 2, name: 'Ruth Lindqvist' };

const event = (id: number, station: string | null): ToolEvent => ({
  id,
  at: '2026-11-20T15:00:00.000Z',
  actor: MEMBER,
  action: 'checked_out',
  fromStatus: 'available',
  toStatus: 'on_loan',
  detail: '',
  station,
});

const drawn = (id: number, station: string | null): LedgerEntry =>
  ledgerEntryFixture(MEMBER, { id, kind: 'draw', quantity: -20, balanceAfter: 100, member: MEMBER, station });

describe('what was done at a crib station', () => {
  it('the tool history says at which station, and nothing for an entry made elsewhere', async () => {
    fakeFetch((call) => (call.path === '/api/tools/T-0001/events' ? { status: 200, body: { data: [event(2, 'Crib door'), event(1, null)] } } : undefined));
    renderWithProviders(<ToolHistory code="T-0001" />);
    const items = await screen.findAllByRole('listitem');
    expect(items[0]!.textContent).toContain('Ruth Lindqvist at Crib door');
    expect(items[1]!.textContent).not.toContain(' at ');
  });

  it('the bin ledger says at which station', async () => {
    fakeFetch((call) => (call.path === '/api/bins/B-0107/ledger' ? { status: 200, body: { data: [drawn(2, 'Crib door'), drawn(1, null)] } } : undefined));
    renderWithProviders(<LedgerList code="B-0107" isQuartermaster={false} />);
    expect((await screen.findByText(/#2 ·/)).textContent).toContain('Ruth Lindqvist at Crib door');
    expect(screen.getByText(/#1 ·/).textContent).not.toContain('Crib door');
  });
});
