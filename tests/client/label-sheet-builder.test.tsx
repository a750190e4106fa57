import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { SheetLayoutDto } from '@shared/schemas/labels';
import { SHEET_LAYOUTS } from '../../labels/layouts';
import { selectAll, unselectAll } from '@/components/ui/item-picking';
import { LabelSheetBuilder } from '@/features/labels/components/label-sheet-builder';
import { filterBins, NO_BIN_FILTER, type PickableBin } from '@/features/labels/utils/bin-selection';
import { describeSheet } from '@/features/labels/utils/sheet-summary';
import { filterTools, NO_FILTER, type PickableTool } from '@/features/labels/utils/tool-selection';
import { setCsrfToken } from '@/lib/api-client';
import { stubPdfDownload } from '../helpers/pdf-download';
import { renderWithProviders } from '../helpers/render';

const tool = (code: string, name: string, category: PickableTool['category'], status: PickableTool['status'] = 'available', location = ''): PickableTool => ({
  code,
  name,
  category,
  status,
  location,
});

const TOOLS = [
  tool('T-0001', 'Hand rivet puller, long handle', 'hand_rivet_puller', 'available', 'Wall board A'),
  tool('T-0002', 'Pneumatic rivet puller', 'pneumatic_rivet_puller', 'on_loan'),
  tool('T-0003', 'Air drill, 90 degree', 'air_drill', 'available', 'Cabinet 2'),
  tool('T-0004', 'Hand rivet puller, short', 'hand_rivet_puller', 'out_of_service'),
];

const bin = (code: string, designation: string, kind: PickableBin['kind'], location = ''): PickableBin => ({ code, designation, kind, location, onHand: 100, unit: 'each' });

const BINS = [
  bin('B-0001', 'Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)', 'blind_structural', 'Rivet cabinet, drawer 2'),
  bin('B-0002', 'MS20470AD4-6', 'solid_rivet', 'Solid rivet cabinet, drawer 2'),
  bin('B-0003', 'MS20426AD3-3.5', 'solid_rivet', 'Solid rivet cabinet, drawer 1'),
  bin('B-0004', 'Screw #8-32 × 1/2 pan head, stainless', 'screw', 'Hardware cabinet, drawer 2'),
];

/** The layouts as the server lists them (the same data in labels/layouts.ts). */
const LAYOUTS: SheetLayoutDto[] = SHEET_LAYOUTS.filter((l) => l.id !== 'a4-3x8-70x37mm').map((l) => ({ ...l }));

const codesIn = (items: { code: string }[]) => items.map((t) => t.code);

describe('tool selection', () => {
  it('filters by words in code, name or place, and by category and status', () => {
    expect(codesIn(filterTools(TOOLS, { ...NO_FILTER, search: 'rivet HAND' }))).toEqual(['T-0001', 'T-0004']);
    expect(codesIn(filterTools(TOOLS, { ...NO_FILTER, search: 'cabinet' }))).toEqual(['T-0003']);
    expect(codesIn(filterTools(TOOLS, { ...NO_FILTER, search: 't-0002' }))).toEqual(['T-0002']);
    expect(codesIn(filterTools(TOOLS, { ...NO_FILTER, category: 'hand_rivet_puller', status: 'available' }))).toEqual(['T-0001']);
  });

  it('selects and clears only the shown tools, keeping picks hidden by the filters', () => {
    const picked = selectAll(new Set(['T-0003']), filterTools(TOOLS, { ...NO_FILTER, category: 'hand_rivet_puller' }));
    expect([...picked].sort()).toEqual(['T-0001', 'T-0003', 'T-0004']);
    expect([...unselectAll(picked, [TOOLS[0]!])].sort()).toEqual(['T-0003', 'T-0004']);
  });

  it('filters bins by words in code, designation or place, and by kind', () => {
    expect(codesIn(filterBins(BINS, { ...NO_BIN_FILTER, search: 'ms20470' }))).toEqual(['B-0002']);
    expect(codesIn(filterBins(BINS, { ...NO_BIN_FILTER, search: 'SOLID cabinet' }))).toEqual(['B-0002', 'B-0003']);
    expect(codesIn(filterBins(BINS, { ...NO_BIN_FILTER, kind: 'solid_rivet', search: 'drawer 1' }))).toEqual(['B-0003']);
  });

  it('describes the labels and pages in words', () => {
    expect(describeSheet(0, 0, 30)).toBe('No tools picked yet.');
    expect(describeSheet(1, 0, 30)).toBe('1 label on 1 page.');
    expect(describeSheet(26, 5, 30)).toBe('26 labels on 2 pages, starting at label 6 of the first page (the first 5 labels stay blank).');
    expect(describeSheet(3, 0, 1)).toBe('3 labels on 3 pages.');
  });
});

describe('LabelSheetBuilder', () => {
  beforeEach(() => setCsrfToken('token-1'));

  it('picks tools by category, counts labels and pages, and downloads the PDF', async () => {
    const requests: { path: string; body: unknown; token: string | undefined }[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn((path: string, init: RequestInit) => {
        const headers = init.headers as Record<string, string>;
        requests.push({ path, body: JSON.parse(init.body as string), token: headers['X-CSRF-Token'] });
        return Promise.resolve(new Response(new Blob(['%PDF-1.3 fake']), { status: 200, headers: { 'Content-Type': 'application/pdf' } }));
      }),
    );
    const createObjectURL = vi.spyOn(URL, 'createObjectURL').mockReturnValue('blob:labels');
    vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
    const clicked: string[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      clicked.push(this.download);
    });

    renderWithProviders(<LabelSheetBuilder tools={TOOLS} layouts={LAYOUTS} />);
    expect(screen.getByText('No tools picked yet.')).toBeTruthy();
    expect(screen.getByRole<HTMLButtonElement>('button', { name: 'Download label sheet (PDF)' }).disabled).toBe(true);

    await userEvent.selectOptions(screen.getByLabelText('Category'), 'hand_rivet_puller');
    await userEvent.click(screen.getByRole('button', { name: 'Select all 2 shown' }));
    expect(screen.getByText(/Showing 2 of 4 tools · 2 selected/)).toBeTruthy();
    await userEvent.selectOptions(screen.getByLabelText('Category'), '');
    await userEvent.click(within(screen.getByRole('list', { name: 'Tools' })).getByRole('checkbox', { name: /T-0003/ }));

    const skip = screen.getByLabelText('Labels already used on the first sheet');
    await userEvent.clear(skip);
    await userEvent.type(skip, '28');
    expect(screen.getByText('3 labels on 2 pages, starting at label 29 of the first page (the first 28 labels stay blank).')).toBeTruthy();

    await userEvent.click(screen.getByRole('button', { name: 'Download label sheet (PDF)' }));
    await waitFor(() => expect(clicked).toEqual(['gripline-labels-letter-3x10-2.625x1in.pdf']));
    expect(requests).toEqual([
      { path: '/api/labels/sheet', body: { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001', 'T-0003', 'T-0004'], skip: 28 }, token: 'token-1' },
    ]);
    expect(createObjectURL).toHaveBeenCalledTimes(1);
  });

  it('shows the server’s words when a code is unknown, and asks for no used labels on a thermal roll', async () => {
    const bodies: unknown[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn((_path: string, init: RequestInit) => {
        bodies.push(JSON.parse(init.body as string));
        const error = { error: { code: 'UNKNOWN_CODES', message: 'No tool has the code T-0002. Take it off the list or check the code.' } };
        return Promise.resolve(new Response(JSON.stringify(error), { status: 400, headers: { 'Content-Type': 'application/json' } }));
      }),
    );
    renderWithProviders(<LabelSheetBuilder tools={TOOLS} layouts={LAYOUTS} />);
    await userEvent.click(screen.getByRole('checkbox', { name: /T-0002/ }));
    await userEvent.selectOptions(screen.getByLabelText('Sheet layout'), 'thermal-1x1-2x1in');
    expect(screen.queryByLabelText('Labels already used on the first sheet')).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Download label sheet (PDF)' }));
    expect((await screen.findByRole('alert')).textContent).toContain('No tool has the code T-0002.');
    expect(bodies).toEqual([{ layoutId: 'thermal-1x1-2x1in', codes: ['T-0002'], skip: 0 }]);
  });
});

describe('LabelSheetBuilder with bins', () => {
  beforeEach(() => setCsrfToken('token-1'));

  it('switches between tools and bins, keeps both picks, and sends tool codes then bin codes', async () => {
    const bodies = stubPdfDownload();

    renderWithProviders(<LabelSheetBuilder tools={TOOLS} bins={BINS} layouts={LAYOUTS} />);
    expect(screen.getByText('No tools or bins picked yet.')).toBeTruthy();
    const switcher = screen.getByRole('group', { name: 'What to label' });
    expect(within(switcher).getByRole('button', { name: 'Tools' }).getAttribute('aria-pressed')).toBe('true');

    await userEvent.click(within(screen.getByRole('list', { name: 'Tools' })).getByRole('checkbox', { name: /T-0003/ }));
    await userEvent.click(within(switcher).getByRole('button', { name: 'Bins' }));
    expect(screen.queryByRole('list', { name: 'Tools' })).toBeNull();
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'solid_rivet');
    expect(screen.getByText(/Showing 2 of 4 bins · 0 selected/)).toBeTruthy();
    await userEvent.click(screen.getByRole('button', { name: 'Select all 2 shown' }));
    const list = screen.getByRole('list', { name: 'Bins' });
    expect(within(list).getByText('MS20426AD3-3.5')).toBeTruthy();
    expect(within(switcher).getByRole('button', { name: /Bins · 2 picked/ }).getAttribute('aria-pressed')).toBe('true');

    await userEvent.click(within(switcher).getByRole('button', { name: /Tools/ }));
    expect(within(screen.getByRole('list', { name: 'Tools' })).getByRole<HTMLInputElement>('checkbox', { name: /T-0003/ }).checked).toBe(true);
    expect(screen.getByText('3 labels on 1 page.')).toBeTruthy();

    await userEvent.click(screen.getByRole('button', { name: 'Download label sheet (PDF)' }));
    await waitFor(() => expect(bodies).toEqual([{ layoutId: 'letter-3x10-2.625x1in', codes: ['T-0003', 'B-0002', 'B-0003'], skip: 0 }]));
  });
});
