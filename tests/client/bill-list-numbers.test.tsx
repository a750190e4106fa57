import { render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { describe, expect, it } from 'vitest';
import type { BillLine } from '@shared/schemas/builds';
import { BillList } from '@/features/planning/components/bill-list';

const line = (over: Partial<BillLine>): BillLine => ({
  description: '1/8 in dome 5056 blind rivet, grip −3',
  kind: 'blind_general',
  diameter32: 4,
  grip: 3,
  lines: [0],
  estimated: 1206,
  withWaste: 1267,
  bin: { code: 'B-0001', designation: 'Blind rivet 1/8 dome', onHand: 1050, location: 'Cabinet A' },
  unstocked: null,
  shortBy: 117,
  drawn: 100,
  toDraw: 1167,
  ...over,
});

function show(bill: BillLine[]) {
  const router = createMemoryRouter([{ path: '/', element: <BillList bill={bill} wastePercent={5} /> }]);
  render(<RouterProvider router={router} />);
}

describe('the assembly’s bill of stock', () => {
  it('writes every count with a thousands separator, as the bin pages do', () => {
    show([line({})]);
    const item = screen.getByRole('listitem', { name: /blind rivet/ });
    expect(item.textContent).toContain('1,206 (1,267 with 5 % waste)');
    expect(item.textContent).toContain('100 of 1,206 estimated');
    expect(item.textContent).toContain('Short by 117:');
    expect(item.textContent).toContain('the bin has 1,050 on hand, 1,167 are still to draw.');
  });
});
