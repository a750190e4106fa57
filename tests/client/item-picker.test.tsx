import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { ItemPicker } from '@/components/ui/item-picker';
import type { PickerFacet } from '@/components/ui/item-picking';

interface Part {
  code: string;
  name: string;
  shelf: string;
}

const PARTS: Part[] = [
  { code: 'P-0001', name: 'Temporary fastener pliers', shelf: 'top' },
  { code: 'P-0002', name: 'Deburring wheel', shelf: 'low' },
  { code: 'P-0003', name: 'Temporary fastener side grip', shelf: 'low' },
];

const SHELF: PickerFacet<Part, 'shelf'>[] = [
  {
    id: 'shelf',
    label: 'Shelf',
    options: [
      { value: '', label: 'Any shelf' },
      { value: 'top', label: 'Top' },
      { value: 'low', label: 'Low' },
    ],
    of: (p) => p.shelf,
  },
];

const searchIn = (p: Part) => [p.code, p.name];

/** The picker as a page holds it: the selection lives with the caller. */
function Harness({ picked }: { picked: (codes: string[]) => void }) {
  const [selected, setSelected] = useState<Set<string>>(() => new Set());
  return (
    <ItemPicker
      items={PARTS}
      selected={selected}
      onChange={(next) => {
        setSelected(next);
        picked([...next].sort());
      }}
      noun={{ one: 'part', many: 'parts' }}
      searchLabel="Search code or name"
      searchIn={searchIn}
      facets={SHELF}
      describe={(p) => p.name}
    />
  );
}

const shownCodes = () =>
  within(screen.getByRole('list', { name: 'Parts' }))
    .getAllByRole('checkbox')
    .map((box) => box.closest('label')?.textContent?.slice(0, 6));

describe('ItemPicker', () => {
  it('narrows the list by code, by name and by a facet, and says what it shows', async () => {
    let last: string[] = [];
    render(<Harness picked={(codes) => (last = codes)} />);
    const search = screen.getByRole('searchbox', { name: 'Search code or name' });

    await userEvent.type(search, 'p-0002');
    expect(shownCodes()).toEqual(['P-0002']);

    await userEvent.clear(search);
    await userEvent.type(search, 'TEMPORARY');
    expect(shownCodes()).toEqual(['P-0001', 'P-0003']);

    await userEvent.selectOptions(screen.getByLabelText('Shelf'), 'low');
    expect(shownCodes()).toEqual(['P-0003']);
    expect(screen.getByText(/Showing 1 of 3 parts · 0 selected/)).toBeTruthy();

    await userEvent.clear(search);
    await userEvent.type(search, 'nothing like it');
    expect(screen.getByText('No part matches these filters.')).toBeTruthy();
    expect(last).toEqual([]);
  });

  it('picks with the keyboard, and select-all takes only what is shown', async () => {
    let last: string[] = [];
    render(<Harness picked={(codes) => (last = codes)} />);

    await userEvent.tab(); // the search box
    await userEvent.tab(); // the shelf
    await userEvent.tab(); // select all
    await userEvent.tab(); // the first part (clear shown is disabled)
    expect(document.activeElement).toBe(screen.getByRole('checkbox', { name: /P-0001/ }));
    await userEvent.keyboard(' ');
    expect(last).toEqual(['P-0001']);

    await userEvent.selectOptions(screen.getByLabelText('Shelf'), 'low');
    await userEvent.click(screen.getByRole('button', { name: 'Select all 2 shown' }));
    expect(last).toEqual(['P-0001', 'P-0002', 'P-0003']);
    expect(screen.getByText(/3 selected \(1 hidden by the filters\)/)).toBeTruthy();

    await userEvent.click(screen.getByRole('button', { name: 'Clear shown' }));
    expect(last).toEqual(['P-0001']);
  });
});
