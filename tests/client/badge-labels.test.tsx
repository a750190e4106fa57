import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { SheetLayoutDto } from '@shared/schemas/labels';
import { SHEET_LAYOUTS } from '../../labels/layouts';
import { LabelSheetBuilder } from '@/features/labels/components/label-sheet-builder';
import { pickablePeople } from '@/features/labels/utils/person-selection';
import { setCsrfToken } from '@/lib/api-client';
import { stubPdfDownload } from '../helpers/pdf-download';
import { renderWithProviders } from '../helpers/render';

const LAYOUTS: SheetLayoutDto[] = SHEET_LAYOUTS.map((l) => ({ ...l }));
const PEOPLE = pickablePeople([
  { id: 3, name: 'Mia Member', hasBadge: true },
  { id: 5, name: 'Otto Other', hasBadge: false },
]);

beforeEach(() => setCsrfToken('tok'));
afterEach(() => vi.unstubAllGlobals());

describe('Labels: people’s badges', () => {
  it('opens on People with the person from the link chosen, warns that the old badge stops working, and sends their id', async () => {
    const bodies = stubPdfDownload();

    renderWithProviders(<LabelSheetBuilder tools={[]} bins={[]} people={PEOPLE} initialPeople={[5]} layouts={LAYOUTS} />);
    const switcher = screen.getByRole('group', { name: 'What to label' });
    expect(within(switcher).getByRole('button', { name: /People/ }).getAttribute('aria-pressed')).toBe('true');
    const list = screen.getByRole('list', { name: 'People' });
    expect(within(list).getByRole<HTMLInputElement>('checkbox', { name: /Otto Other/ }).checked).toBe(true);
    expect(within(list).getByRole<HTMLInputElement>('checkbox', { name: /Mia Member/ }).checked).toBe(false);
    expect(within(list).getByText('Has a badge')).toBeTruthy();
    expect(screen.getByText('Printing a badge replaces that person’s old one.')).toBeTruthy();

    await userEvent.click(screen.getByRole('button', { name: 'Download label sheet (PDF)' }));
    await waitFor(() => expect(bodies).toEqual([{ layoutId: LAYOUTS[0]!.id, codes: [], people: [5], skip: 0 }]));
  });
});
