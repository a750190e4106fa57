import { render, waitFor } from '@testing-library/react';
import { cloneElement, type ReactElement } from 'react';
import type * as Recharts from 'recharts';
import { describe, expect, it, vi } from 'vitest';
import type { SpendMonth } from '@shared/schemas/stock-money';
import { BIN_KINDS, type BinKind } from '@shared/stock/kinds';
import { SpendChart } from '@/features/stock-money/components/spend-chart';

// happy-dom lays nothing out, so the responsive wrapper would measure 0 × 0: hand the real chart a fixed size.
vi.mock('recharts', async (original) => ({
  ...(await original<typeof Recharts>()),
  ResponsiveContainer: ({ children }: { children: ReactElement<{ width?: number; height?: number }> }) => cloneElement(children, { width: 600, height: 320 }),
}));

const month = (m: string, used: Partial<Record<BinKind, number>>): SpendMonth => ({
  month: m,
  consumedCents: Object.values(used).reduce((s, v) => s + v, 0),
  byKind: { ...(Object.fromEntries(BIN_KINDS.map((k) => [k, 0])) as Record<BinKind, number>), ...used },
  purchasedCents: 0,
  countAdjustmentCents: 0,
});

/** The money axis's labels, lowest first. */
const tickValues = (container: HTMLElement) =>
  [...container.querySelectorAll('text.recharts-cartesian-axis-tick-value[orientation="left"]')]
    .sort((a, b) => Number(b.getAttribute('y')) - Number(a.getAttribute('y')))
    .map((t) => t.textContent ?? '');

describe('the consumables chart', () => {
  it('keeps its axis at $0 when the only use below zero is a few cents of returns', async () => {
    // As the demo chapter's August: $63.35 of structural blind rivets, and 59 cents more of general ones came back than went out.
    const months = [month('2026-07', { blind_structural: 6142, sealant_primer: 1675 }), month('2026-08', { blind_structural: 6335, blind_general: -59 }), month('2026-09', {})];
    const { container } = render(<SpendChart months={months} kinds={['blind_structural', 'blind_general', 'sealant_primer']} />);
    await waitFor(() => expect(tickValues(container).length).toBeGreaterThan(1));
    const ticks = tickValues(container);
    // $78.17 at the most, 59 cents below: steps of $20 from $0, the 59 cents still drawn under the line.
    expect(ticks).toEqual(['$0', '$20', '$40', '$60', '$80']);
  });

  it('runs a step below zero when a month gave back more than it used', async () => {
    const months = [month('2026-07', { blind_structural: 30_000 }), month('2026-08', { blind_structural: -12_000 })];
    const { container } = render(<SpendChart months={months} kinds={['blind_structural']} />);
    await waitFor(() => expect(tickValues(container).length).toBeGreaterThan(1));
    const ticks = tickValues(container);
    // $300 up and $120 down: steps of $200 (about four over the $420), one of them below zero.
    expect(ticks).toEqual(['-$200', '$0', '$200', '$400']);
  });
});
