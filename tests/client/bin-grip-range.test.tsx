import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { BinDetails } from '@/features/stock/components/bin-summary';
import { binFixture } from '../helpers/bin-fixture';
import { renderWithProviders } from '../helpers/render';

const blind = { kind: 'blind_structural', head: 'dome', material: '5056', diameter32: 4, grip16: 3 } as const;
const gripText = () => screen.getByText('Grip').nextElementSibling?.textContent;

describe('BinDetails: the grip range', () => {
  it('shows the table’s band for the dash as it is', () => {
    // −3: 0.126–0.187 in (TM 10-5410-221-14/1 Table 4-3).
    renderWithProviders(<BinDetails bin={binFixture('B-0107', blind)} isQuartermaster={false} />);
    expect(gripText()).toBe('−3: sheet stack 0.126–0.187 in');
  });

  it('shows the range from the box, and says so', () => {
    renderWithProviders(<BinDetails bin={binFixture('B-0107', { ...blind, gripMin: 0.11, gripMax: 0.14 })} isQuartermaster={false} />);
    expect(gripText()).toBe('−3: sheet stack 0.110–0.140 in (from the box)');
  });
});
