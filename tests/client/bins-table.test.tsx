import { Suspense } from 'react';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { BinsRoute } from '@/app/routes/app/bins';
import { BinTable } from '@/features/stock/components/bin-table';
import { binFixture } from '../helpers/bin-fixture';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const BINS = [
  binFixture('B-0001', { kind: 'blind_structural', head: 'dome', material: '5056', stemMaterial: 'steel', diameter32: 4, grip16: 2, onHand: 80, reorderPoint: 200, location: 'Cabinet R, drawer 1' }),
  binFixture('B-0002', { kind: 'blind_general', head: 'dome', material: 'aluminium', stemMaterial: 'steel', diameter32: 5, grip16: 3, onHand: 900, location: 'Cabinet R, drawer 2' }),
  binFixture('B-0003', { kind: 'solid_rivet', head: 'dome', material: '2117-T4', diameter32: 4, length16: 6, onHand: 1500, reorderPoint: 500, location: 'Cabinet S, drawer 1' }),
  binFixture('B-0004', { kind: 'screw', name: 'Screw #8-32 × 1/2 pan head', onHand: 40, reorderPoint: 50, location: 'Cabinet H, drawer 3' }),
  binFixture('B-0005', { kind: 'drill_bit', name: 'Drill bit #40, jobber', drillSize: '#40', unit: 'bit', packSize: 12, onHand: 30, reorderPoint: 6, location: 'Cabinet S, drawer 1' }),
];

const rows = () => screen.getAllByRole('row').slice(1);
const codes = () => rows().map((r) => within(r).getAllByRole('cell')[0]!.textContent);
const shown = () => screen.getByText(/^Showing \d+ of \d+ bins$/).textContent;

afterEach(() => vi.unstubAllGlobals());

describe('BinTable', () => {
  it('lists every bin by code, with on hand and unit, and says which are low in words', () => {
    renderWithProviders(<BinTable bins={BINS} />);
    expect(codes()).toEqual(['B-0001', 'B-0002', 'B-0003', 'B-0004', 'B-0005']);
    expect(shown()).toBe('Showing 5 of 5 bins');
    const first = rows()[0]!;
    expect(within(first).getByText('80 each')).toBeTruthy();
    expect(within(first).getByText('Low stock')).toBeTruthy();
    expect(within(rows()[2]!).queryByText('Low stock')).toBeNull();
    expect(within(rows()[4]!).getByText('30 bits')).toBeTruthy();
    expect(within(first).getByRole('link', { name: 'B-0001' }).getAttribute('href')).toBe('/bins/B-0001');
  });

  it('shows a blind rivet’s grip range beside its dash, and solid rivets by their standard number', () => {
    renderWithProviders(<BinTable bins={BINS} />);
    // Grip −2 covers 0.063–0.125 in: TM 10-5410-221-14/1 Table 4-3.
    expect(within(rows()[0]!).getByText(/grip −2 \(0\.063–0\.125 in\)/)).toBeTruthy();
    // MS20470AD4-6: universal head, 2117-T4, 1/8 in, 3/8 in long (AC 43.13-1B para 4-57a; NAVEDTRA 14315 Table 3-1).
    expect(within(rows()[2]!).getByText('MS20470AD4-6')).toBeTruthy();
    expect(within(rows()[2]!).getByText('Solid rivet')).toBeTruthy();
  });

  it('adds the grip range beside the dash when the designation does not carry it', () => {
    renderWithProviders(<BinTable bins={[{ ...BINS[0]!, designation: 'Blind rivet 1/8 dome' }]} />);
    // Grip −2 covers 0.063–0.125 in: TM 10-5410-221-14/1 Table 4-3.
    expect(within(rows()[0]!).getByText(/takes 0\.063–0\.125 in of sheet/)).toBeTruthy();
  });

  it('narrows to low bins with the Low stock toggle, and back', async () => {
    renderWithProviders(<BinTable bins={BINS} />);
    await userEvent.click(screen.getByRole('checkbox', { name: 'Low stock only' }));
    expect(codes()).toEqual(['B-0001', 'B-0004']);
    expect(shown()).toBe('Showing 2 of 5 bins');
    await userEvent.click(screen.getByRole('checkbox', { name: 'Low stock only' }));
    expect(shown()).toBe('Showing 5 of 5 bins');
  });

  it('filters by diameter, then grip dash, material, kind and shelf', async () => {
    renderWithProviders(<BinTable bins={BINS} />);
    await userEvent.selectOptions(screen.getByLabelText('Diameter'), '1/8 in');
    expect(codes()).toEqual(['B-0001', 'B-0003']);
    await userEvent.selectOptions(screen.getByLabelText('Grip dash'), '−2 (0.063–0.125 in)');
    expect(codes()).toEqual(['B-0001']);
    expect(screen.getByText(/\(2 on\)/)).toBeTruthy();
    await userEvent.selectOptions(screen.getByLabelText('Grip dash'), 'Any grip');
    await userEvent.selectOptions(screen.getByLabelText('Material'), '2117-T4');
    expect(codes()).toEqual(['B-0003']);
    await userEvent.selectOptions(screen.getByLabelText('Diameter'), 'Any diameter');
    await userEvent.selectOptions(screen.getByLabelText('Material'), 'Any material');
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'Drill bit');
    expect(codes()).toEqual(['B-0005']);
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'All kinds');
    await userEvent.selectOptions(screen.getByLabelText('Shelf'), 'Cabinet S, drawer 1');
    expect(codes()).toEqual(['B-0003', 'B-0005']);
  });

  it('searches codes, designations and names, and says when nothing matches', async () => {
    renderWithProviders(<BinTable bins={BINS} />);
    await userEvent.type(screen.getByLabelText('Search code, designation or shelf'), 'pan head');
    expect(codes()).toEqual(['B-0004']);
    await userEvent.clear(screen.getByLabelText('Search code, designation or shelf'));
    await userEvent.type(screen.getByLabelText('Search code, designation or shelf'), 'ms20426');
    expect(screen.getByText('No bin matches these filters.')).toBeTruthy();
  });
});

describe('BinsRoute', () => {
  const user = (role: 'member' | 'quartermaster') => ({ id: 1, name: 'Wren Halloway', email: 'wren@example.org', role });
  const serve = (role: 'member' | 'quartermaster') =>
    fakeFetch((call) =>
      call.path === '/api/auth/me'
        ? { status: 200, body: { user: user(role) } }
        : call.path === '/api/bins?pageSize=500'
          ? { status: 200, body: { data: BINS, meta: { total: BINS.length, page: 1, pageSize: 500 } } }
          : undefined,
    );

  it('loads all bins in one page and offers Add bin to a quartermaster', async () => {
    const calls = serve('quartermaster');
    renderWithProviders(
      <Suspense fallback="Loading">
        <BinsRoute />
      </Suspense>,
    );
    expect(await screen.findByRole('link', { name: 'Add bin' })).toBeTruthy();
    expect(screen.getByText('Showing 5 of 5 bins')).toBeTruthy();
    expect(calls.map((c) => c.path)).toContain('/api/bins?pageSize=500');
  });

  it('offers no Add bin to a member', async () => {
    serve('member');
    renderWithProviders(
      <Suspense fallback="Loading">
        <BinsRoute />
      </Suspense>,
    );
    expect(await screen.findByText('Showing 5 of 5 bins')).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Add bin' })).toBeNull();
  });
});
