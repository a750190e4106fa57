import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { ImportPreview } from '@shared/schemas/bin-import';
import { BinImportPanel } from '@/features/stock-import/components/bin-import-panel';
import { StockExportPanel } from '@/features/stock-import/components/stock-export-panel';
import { defaultLedgerRange } from '@/features/stock-import/utils/csv-links';
import { setChapterTimeZone } from '@/lib/chapter-zone';
import { setCsrfToken } from '@/lib/api-client';
import { fakeFetch, renderWithProviders } from '../helpers/render';

beforeEach(() => setCsrfToken('token-1'));

const CSV = 'kind,head,material,diameter_32nds,grip_dash\nblind_structural,dome,5056,4,2\nblind_structural,dome,5056,4,7\n';
const BLIND = 'Blind, structural, dome, 5056 · 1/8 in · grip −2 (0.063–0.125 in)';

/** What the server answers for CSV above: line 2 ready, line 3 with grip dash 7, which the table lacks. */
const MIXED: ImportPreview = {
  rows: [
    { line: 2, code: 'B-0004', designation: BLIND, status: 'new', changes: [], warnings: [], errors: [] },
    { line: 3, code: 'B-0005', designation: '', status: 'problem', changes: [], warnings: [], errors: [{ column: 'grip_dash', message: 'Line 3, grip_dash: use a grip dash from the table: 1 to 6, or 8.' }] },
  ],
  counts: { new: 1, update: 0, unchanged: 0, problem: 1 },
  columns: ['kind', 'head', 'material', 'diameter_32nds', 'grip_dash'],
  fileErrors: [],
  canImport: false,
};
const ALL_READY: ImportPreview = { ...MIXED, rows: [MIXED.rows[0]!, { ...MIXED.rows[0]!, line: 3, code: 'B-0005' }], counts: { new: 2, update: 0, unchanged: 0, problem: 0 }, canImport: true };

const importButton = () => screen.getByRole<HTMLButtonElement>('button', { name: /^Import/ });
const pasteCsv = async (text: string) => {
  await userEvent.click(screen.getByLabelText('Or paste the CSV here'));
  await userEvent.paste(text);
};

describe('BinImportPanel', () => {
  it('shows each row ready or with its problems in words, and keeps Import closed while any row is bad', async () => {
    const calls = fakeFetch((call) => (call.path === '/api/bins/import/preview' ? { status: 200, body: MIXED } : undefined));
    renderWithProviders(<BinImportPanel />);
    expect(importButton().disabled).toBe(true);
    expect(screen.getByRole<HTMLButtonElement>('button', { name: 'Check file' }).disabled).toBe(true);

    await pasteCsv(CSV);
    await userEvent.click(screen.getByRole('button', { name: 'Check file' }));
    expect(await screen.findByText('2 rows: 1 new, 1 with problems.')).toBeTruthy();
    expect(calls).toEqual([expect.objectContaining({ method: 'POST', path: '/api/bins/import/preview', body: { csv: CSV } })]);

    // Only the row with problems shows at first; the whole file on request.
    const table = screen.getByRole('table', { name: 'Rows of the file' });
    expect(within(table).getByText('Line 3, grip_dash: use a grip dash from the table: 1 to 6, or 8.')).toBeTruthy();
    expect(within(table).queryByText(BLIND)).toBeNull();
    await userEvent.selectOptions(screen.getByRole('combobox', { name: 'Show' }), 'Every row');
    expect(within(table).getByText(BLIND)).toBeTruthy();
    expect(within(table).getByText('New bin')).toBeTruthy();

    expect(importButton().textContent).toBe('Import bins');
    expect(importButton().disabled).toBe(true);
    expect(calls.some((c) => c.path === '/api/bins/import')).toBe(false);
  });

  it('reads a chosen file, imports the checked text only, and links to the bins afterwards', async () => {
    const calls = fakeFetch((call) => {
      if (call.path === '/api/bins/import/preview') return { status: 200, body: ALL_READY };
      if (call.path === '/api/bins/import') return { status: 201, body: { created: ['B-0004', 'B-0005'], updated: [], unchanged: 0 } };
      return undefined;
    });
    const onImported = vi.fn();
    renderWithProviders(<BinImportPanel onImported={onImported} />);
    await userEvent.upload(screen.getByLabelText('CSV file'), new File([CSV], 'bins.csv', { type: 'text/csv' }));
    await waitFor(() => expect(screen.getByLabelText<HTMLTextAreaElement>('Or paste the CSV here').value).toBe(CSV));

    await userEvent.click(screen.getByRole('button', { name: 'Check file' }));
    await waitFor(() => expect(importButton().disabled).toBe(false));
    expect(importButton().textContent).toBe('Import 2 new bins');

    // A change after the check closes Import until the file is checked again.
    await pasteCsv('x');
    expect(importButton().disabled).toBe(true);
    await userEvent.keyboard('{Backspace}');
    expect(importButton().disabled).toBe(false);

    await userEvent.click(importButton());
    expect(await screen.findByText('Added 2 bins')).toBeTruthy();
    expect(screen.getByText('New: B-0004, B-0005.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Open the bins' }).getAttribute('href')).toBe('/bins');
    expect(onImported).toHaveBeenCalledWith({ created: ['B-0004', 'B-0005'], updated: [], unchanged: 0 });
    expect(calls.filter((c) => c.path === '/api/bins/import')).toEqual([expect.objectContaining({ body: { csv: CSV }, headers: expect.objectContaining({ 'X-CSRF-Token': 'token-1' }) })]);
    expect(screen.getByLabelText<HTMLTextAreaElement>('Or paste the CSV here').value).toBe('');
  });

  it('shows updates with each change old → new, hides unchanged rows at first, and says what is worth a check', async () => {
    const REIMPORT: ImportPreview = {
      rows: [
        { line: 2, code: 'B-0001', designation: BLIND, status: 'update', changes: [{ column: 'location', from: 'Shelf A2', to: 'Shelf B1' }, { column: 'notes', from: 'Top shelf', to: '' }], warnings: [{ column: 'on_hand', message: 'Line 2, on_hand: the file says 999 on hand and the bin holds 480. Stock moves only through the ledger, so this is ignored: count the bin to correct it.' }], errors: [] },
        { line: 3, code: 'B-0002', designation: 'Washer #10 flat', status: 'unchanged', changes: [], warnings: [], errors: [] },
        { line: 4, code: 'B-0003', designation: BLIND, status: 'new', changes: [], warnings: [{ column: '', message: `Line 4: bin B-0001 already holds this (${BLIND}). Import the row only if you mean a second bin of it.` }], errors: [] },
      ],
      counts: { new: 1, update: 1, unchanged: 1, problem: 0 },
      columns: ['code', 'kind'],
      fileErrors: [],
      canImport: true,
    };
    fakeFetch((call) => (call.path === '/api/bins/import/preview' ? { status: 200, body: REIMPORT } : undefined));
    renderWithProviders(<BinImportPanel />);
    await pasteCsv(CSV);
    await userEvent.click(screen.getByRole('button', { name: 'Check file' }));
    expect(await screen.findByText('3 rows: 1 new, 1 update, 1 unchanged. 2 to check.')).toBeTruthy();
    expect(importButton().textContent).toBe('Import 1 new bin and 1 update');

    const table = screen.getByRole('table', { name: 'Rows of the file' });
    const changes = within(table).getByRole('list', { name: 'Changes to B-0001' });
    expect(within(changes).getAllByRole('listitem').map((li) => li.textContent)).toEqual(['location: Shelf A2 →  becomes Shelf B1', 'notes: Top shelf →  becomes (empty)']);
    expect(within(table).getByText(/the file says 999 on hand and the bin holds 480/)).toBeTruthy();
    expect(within(table).getByText(/bin B-0001 already holds this/)).toBeTruthy();
    expect(within(table).queryByText('Washer #10 flat')).toBeNull();
    await userEvent.selectOptions(screen.getByRole('combobox', { name: 'Show' }), 'Every row');
    expect(within(table).getByText('Washer #10 flat')).toBeTruthy();
    expect(within(table).getByText('Unchanged')).toBeTruthy();
  });

  it('says there is nothing to import when every row already matches its bin', async () => {
    const SAME: ImportPreview = { ...MIXED, rows: [{ ...MIXED.rows[0]!, code: 'B-0001', status: 'unchanged' }], counts: { new: 0, update: 0, unchanged: 1, problem: 0 }, canImport: false };
    fakeFetch((call) => (call.path === '/api/bins/import/preview' ? { status: 200, body: SAME } : undefined));
    renderWithProviders(<BinImportPanel />);
    await pasteCsv(CSV);
    await userEvent.click(screen.getByRole('button', { name: 'Check file' }));
    expect(await screen.findByText('Every row of the file already matches its bin.')).toBeTruthy();
    expect(importButton().disabled).toBe(true);
  });

  it('says nothing was imported, and why, when the server refuses the file', async () => {
    fakeFetch((call) => {
      if (call.path === '/api/bins/import/preview') return { status: 200, body: ALL_READY };
      const issues = [{ path: 'line 2.code', message: 'Line 2, code: B-0004 is already on a bin in the crib. Leave the code empty to get the next free one.' }];
      return { status: 400, body: { error: { code: 'IMPORT_INVALID', message: 'Nothing was imported: 1 of 2 rows have problems. Fix them and check the file again.', issues } } };
    });
    renderWithProviders(<BinImportPanel />);
    await pasteCsv(CSV);
    await userEvent.click(screen.getByRole('button', { name: 'Check file' }));
    await waitFor(() => expect(importButton().disabled).toBe(false));
    await userEvent.click(importButton());
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Nothing was imported: 1 of 2 rows have problems.');
    expect(alert.textContent).toContain('Line 2, code: B-0004 is already on a bin in the crib.');
  });

  it('offers the template as a download', () => {
    renderWithProviders(<BinImportPanel />);
    const link = screen.getByRole('link', { name: 'Download a template' });
    expect(link.getAttribute('href')).toBe('/api/bins/import/template.csv');
    expect(link.hasAttribute('download')).toBe(true);
  });
});

describe('StockExportPanel', () => {
  it('links the bins and the ledger for the chosen days, and refuses an end before the start', async () => {
    renderWithProviders(<StockExportPanel now={new Date(2026, 11, 14, 9, 30)} />);
    expect(defaultLedgerRange(new Date(2026, 11, 14, 9, 30))).toEqual({ from: '2026-12-01', to: '2026-12-14' });
    setChapterTimeZone('Pacific/Auckland'); // 12:00 UTC on November 30 is already December 1 there
    expect(defaultLedgerRange(new Date('2026-11-30T12:00:00Z'))).toEqual({ from: '2026-12-01', to: '2026-12-01' });
    setChapterTimeZone('UTC');
    expect(screen.getByRole('link', { name: 'Export bins (CSV)' }).getAttribute('href')).toBe('/api/bins/export.csv');
    expect(screen.getByRole('link', { name: 'Export ledger (CSV)' }).getAttribute('href')).toBe('/api/bins/ledger.csv?from=2026-12-01&to=2026-12-14');

    const from = screen.getByLabelText('From');
    await userEvent.clear(from);
    await userEvent.type(from, '2026-12-20');
    expect(screen.queryByRole('link', { name: 'Export ledger (CSV)' })).toBeNull();
    expect(screen.getByRole<HTMLButtonElement>('button', { name: 'Export ledger (CSV)' }).disabled).toBe(true);
    expect(screen.getByRole('alert').textContent).toBe('The end date is before the start date: swap them.');
  });
});

describe('BinImportPanel reading a file that is not UTF-8', () => {
  it('reads a Windows-1252 file with its accents intact and says how it was read', async () => {
    const calls = fakeFetch((call) => (call.path === '/api/bins/import/preview' ? { status: 200, body: MIXED } : undefined));
    renderWithProviders(<BinImportPanel />);
    // "Société" with é as the single Windows-1252 byte 0xE9.
    const bytes = Uint8Array.from([...'kind,notes\nscrew,Soci'].map((c) => c.charCodeAt(0)).concat([0xe9, 0x74, 0xe9, 0x0a]));
    await userEvent.upload(screen.getByLabelText('CSV file'), new File([bytes], 'bins-1252.csv', { type: 'text/csv' }));
    expect(await screen.findByText('bins-1252.csv is not UTF-8; it was read as Windows-1252 text. Check the accented letters in the preview.')).toBeTruthy();
    await userEvent.click(screen.getByRole('button', { name: 'Check file' }));
    await waitFor(() => expect(calls.at(-1)?.body).toEqual({ csv: 'kind,notes\nscrew,Société\n' }));
  });

  it('refuses a file that is not text, and sends nothing', async () => {
    const calls = fakeFetch(() => undefined);
    renderWithProviders(<BinImportPanel />);
    await userEvent.upload(screen.getByLabelText('CSV file'), new File([Uint8Array.from([0x50, 0x4b, 0x03, 0x04, 0x81, 0x00])], 'bins.xlsx', { type: 'text/csv' }));
    expect(await screen.findByText(/^bins\.xlsx: This file is not text Gripline can read/)).toBeTruthy();
    expect(calls).toEqual([]);
  });
});
