import { Suspense } from 'react';
import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { RestockRoute } from '@/app/routes/app/restock';
import { RestockList } from '@/features/stock/components/restock-list';
import { restockFixture } from '../helpers/bin-fixture';
import { fakeFetch, renderWithProviders } from '../helpers/render';

// Reorder quantities rounded up to whole packs, as the server sends them: 250 in packs of 100 → 300 (3 packs).
const ITEMS = [
  restockFixture('B-0003', {
    kind: 'solid_rivet', head: 'dome', material: '2117-T4', diameter32: 4, length16: 6,
    supplier: 'Prairie Aero Supply', supplierPart: 'PAS-470-4-6', packSize: 100, reorderQty: 250, onHand: 60, reorderPoint: 200, unitCost: 0.03,
    toOrder: 300, packsToOrder: 3, orderCostCents: 900,
  }),
  restockFixture('B-0001', {
    kind: 'blind_structural', head: 'dome', material: '5056', stemMaterial: 'steel', diameter32: 4, grip16: 2,
    supplier: 'Prairie Aero Supply', supplierPart: 'PAS-B42', packSize: 250, reorderQty: 500, onHand: 80, reorderPoint: 200, unitCost: 0.0825,
    toOrder: 500, packsToOrder: 2, orderCostCents: 4125, onOrder: 250, reorderAt: 240,
  }),
  restockFixture('B-0020', {
    kind: 'sealant_primer', name: 'Two-part fuel tank sealant, 6 oz', unit: 'tube',
    supplier: 'Cedar Hollow Aircraft Parts', packSize: 1, reorderQty: 2, onHand: 1, reorderPoint: 1, unitCost: 38.5,
    toOrder: 2, packsToOrder: 2, orderCostCents: 7700,
  }),
  restockFixture('B-0031', { kind: 'other', name: 'Masking tape 1 in', unit: 'roll', supplier: '', packSize: 6, reorderQty: 4, onHand: 2, reorderPoint: 3, unitCost: 4, toOrder: 6, packsToOrder: 1, orderCostCents: 2400 }),
];

const sections = () => screen.getAllByRole('region');

afterEach(() => vi.unstubAllGlobals());

describe('RestockList', () => {
  it('groups low bins by supplier by name, bins without one last, with a total for each', () => {
    renderWithProviders(<RestockList items={ITEMS} />);
    expect(sections().map((s) => within(s).getByRole('heading').textContent)).toEqual(['Cedar Hollow Aircraft Parts', 'Prairie Aero Supply', 'No supplier set']);
    const prairie = screen.getByRole('region', { name: 'Prairie Aero Supply' });
    // 900 + 4125 cents
    expect(within(prairie).getByText('$50.25')).toBeTruthy();
    expect(within(prairie).getAllByRole('listitem').map((li) => within(li).getAllByRole('link')[0]!.textContent)).toEqual(['B-0001', 'B-0003']);
    expect(screen.getByText(/4 bins need ordering, from 3 suppliers/)).toBeTruthy();
    // 5025 + 7700 + 2400 cents
    expect(screen.getByText('$151.25')).toBeTruthy();
  });

  it('shows on hand against the reorder point, units and whole packs to order, part number and cost', () => {
    renderWithProviders(<RestockList items={ITEMS} />);
    const line = screen.getAllByRole('listitem').find((li) => li.textContent?.includes('B-0003'))!;
    expect(within(line).getByText('MS20470AD4-6')).toBeTruthy();
    expect(within(line).getByText('60 each on hand; reorder at 200')).toBeTruthy();
    expect(within(line).getByText('300 each')).toBeTruthy();
    expect(within(line).getByText('3 packs × 100')).toBeTruthy();
    expect(within(line).getByText('PAS-470-4-6')).toBeTruthy();
    expect(within(line).getByText('$9.00')).toBeTruthy();
    expect(within(line).getByRole('link', { name: 'B-0003' }).getAttribute('href')).toBe('/bins/B-0003');
    const tape = screen.getAllByRole('listitem').find((li) => li.textContent?.includes('B-0031'))!;
    expect(within(tape).getByText('1 pack × 6')).toBeTruthy();
    const sealant = screen.getAllByRole('listitem').find((li) => li.textContent?.includes('B-0020'))!;
    expect(within(sealant).queryByText(/pack/)).toBeNull();
  });

  it('shows what is already on order and the reorder point in force beside each bin', () => {
    renderWithProviders(<RestockList items={ITEMS} />);
    const row = screen.getByRole('link', { name: 'B-0001' }).closest('li')!;
    expect(row.textContent).toContain('80 each on hand, 250 each on order; reorder at 240');
  });

  it('says in words when nothing needs ordering', () => {
    renderWithProviders(<RestockList items={[]} />);
    expect(screen.getByText('Nothing to order.')).toBeTruthy();
    expect(screen.getByText('Every bin has more on hand and on order than its reorder point.')).toBeTruthy();
    expect(screen.queryAllByRole('region')).toEqual([]);
  });
});

describe('RestockRoute', () => {
  it('reads the quartermaster’s Restock list from the API', async () => {
    const calls = fakeFetch((call) => (call.path === '/api/bins/restock' ? { status: 200, body: { data: ITEMS } } : undefined));
    renderWithProviders(
      <Suspense fallback="Loading">
        <RestockRoute />
      </Suspense>,
    );
    expect(await screen.findByRole('heading', { name: 'Restock' })).toBeTruthy();
    expect(sections()).toHaveLength(3);
    expect(calls.map((c) => c.path)).toEqual(['/api/bins/restock']);
  });
});
