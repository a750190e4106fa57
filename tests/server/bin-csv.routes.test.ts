import Papa from 'papaparse';
import { describe, expect } from 'vitest';
import { importPreviewSchema, importResultSchema } from '@shared/schemas/bin-import';
import { errorEnvelopeSchema } from '@shared/schemas/errors';
import { addBinAs, blindRivetBin, post } from '../helpers/crib';
import { giveAssemblies } from '../helpers/planning';
import { findUserByEmail } from '../../server/accounts/users.repo';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { crewTest } from '../helpers/crew-test';
import { buildTestApp, type SignedInAgent } from '../helpers/test-app';

const HEADER = 'code,kind,name,head,material,stem_material,diameter_32nds,grip_dash,length_16ths,unit,pack_size,unit_cost,notes,opening_stock';
const csvOf = (...rows: string[]) => [HEADER, ...rows].join('\r\n');

/** Reads a CSV answer as records by column name (the byte-order mark off). */
function records(text: string): Record<string, string>[] {
  return Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: true }).data;
}

const GOOD_BLIND = ',blind_structural,,dome,5056,steel,1/8,2,,each,100,0.12,,500';
const GOOD_SCREW = ',Screw,Screw #8-32 × 1/2 pan head,,,,,,,each,50,0.09,,120';

const test = crewTest
  .extend('binCount', ({ qm }) => async (who: SignedInAgent = qm) => ((await who.agent.get('/api/bins')).body as { meta: { total: number } }).meta.total)
  .extend('at', ({ clock }) => (iso: string) => {
    clock.now = new Date(iso);
  })
  /** The crib's export, read back as records, and written again with `edit` applied to each record. */
  .extend('editedExport', ({ qm }) => async (edit: (r: Record<string, string>) => void = () => {}): Promise<string> => {
    const rows = records((await qm.agent.get('/api/bins/export.csv')).text);
    rows.forEach(edit);
    return Papa.unparse(rows, { newline: '\r\n' });
  })
  .extend('twoBins', ({ qm, member }) => async () => {
    await addBinAs(qm, blindRivetBin({ initialQuantity: 500, supplier: 'Cedar Valley Fastener Supply', location: 'Shelf A2' }));
    await addBinAs(qm, { kind: 'screw', name: 'Screw #8-32 × 1/2 pan head', unit: 'each', packSize: 50, unitCost: 0.09, initialQuantity: 120, notes: 'Keep dry.\nSecond line' });
    expect((await post(member, '/api/bins/B-0001/draw', { quantity: 20 })).status).toBe(201);
  });

describe('POST /api/bins/import/preview', () => {
  test('checks each row, naming the line and column of every problem, and creates nothing', async ({ qm, binCount }) => {
    await addBinAs(qm, blindRivetBin());
    const csv = csvOf(
      GOOD_BLIND, // line 2
      ',Solid rivet,,universal,2117-t4,,4,,6,each,100,0.03,"Top shelf,\nleft bin",200', // lines 3-4: a quoted note over two lines
      ',rivet,,dome,5056,,4,2,,each,1,0.1,,0', // line 5
      ',blind_general,,dome,5056,aluminium,4,,,each,1,0.1,,0', // line 6
      ',blind_structural,,dome,5056,steel,5/32,7,,each,1,0.1,,0', // line 7
      ',Screw,Screw #8-32 × 1/2,,,,,,,each,50,0.12345,,0', // line 8
      'B-0001,nut,Nut #10-32 nylon insert,,,,,,,each,100,0.05,,0', // line 9
      'B-0100,washer,Washer #10 flat,,,,,,,each,100,0.02,,300', // line 10
      'b-0100,washer,Washer #10 flat,,,,,,,each,100,0.02,,300', // line 11
    );
    const res = await post(qm, '/api/bins/import/preview', { csv });
    expect(res.status).toBe(200);
    const preview = importPreviewSchema.strict().parse(res.body);
    expect(preview).toMatchObject({ counts: { new: 3, update: 0, unchanged: 0, problem: 6 }, canImport: false, fileErrors: [] });
    expect(preview.columns).toEqual(HEADER.split(','));

    const byLine = new Map(preview.rows.map((r) => [r.line, r]));
    expect([...byLine.keys()]).toEqual([2, 3, 5, 6, 7, 8, 9, 10, 11]);
    // Grip -2 covers 0.063–0.125 in: TM 10-5410-221-14/1 Table 4-3 (the IFI 114 convention).
    expect(byLine.get(2)).toEqual({
      line: 2,
      code: 'B-0002',
      status: 'new',
      changes: [],
      errors: [],
      warnings: [{ column: '', message: 'Line 2: bin B-0001 already holds this (Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)). Import the row only if you mean a second bin of it.' }],
      designation: 'Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)',
    });
    // MS20470AD4-6: universal head, 2117-T4, 1/8 in, 3/8 in long (AC 43.13-1B para 4-57a).
    expect(byLine.get(3)).toMatchObject({ code: 'B-0003', status: 'new', designation: 'MS20470AD4-6' });
    expect(byLine.get(10)).toMatchObject({ code: 'B-0100', status: 'new', designation: 'Washer #10 flat' });

    const errorsOn = (line: number) => byLine.get(line)!.errors;
    expect(errorsOn(5)).toEqual([{ column: 'kind', message: expect.stringMatching(/^Line 5, kind: "rivet" is not a kind of bin\. Use one of: Blind rivet – structural, /) }]);
    expect(errorsOn(6)).toEqual([{ column: 'grip_dash', message: 'Line 6, grip_dash: a blind rivet bin needs its grip dash, like 2 for 0.063–0.125 in.' }]);
    expect(errorsOn(7)).toEqual([{ column: 'grip_dash', message: 'Line 7, grip_dash: use a grip dash from the table: 1 to 6, or 8.' }]);
    expect(errorsOn(8)).toEqual([{ column: 'unit_cost', message: 'Line 8, unit_cost: give the unit cost to at most 4 decimals (a hundredth of a cent).' }]);
    // A code on a bin of another kind is not an edit of that bin (a file from another crib, most likely).
    expect(errorsOn(9)).toEqual([{ column: 'kind', message: "Line 9, kind: B-0001 is a bin of blind rivet – structural, not nut. Leave the code empty to add a new bin, or keep the bin's kind." }]);
    expect(errorsOn(11)).toEqual([{ column: 'code', message: 'Line 11, code: B-0100 is also on line 10; each bin needs its own code.' }]);
    expect(preview.rows.filter((r) => r.status === 'problem').every((r) => r.errors.length > 0)).toBe(true);

    expect(await binCount()).toBe(1);
  });

  test('reads kinds by label in any case, diameters as fractions, dashes with the trade’s leading dash, and a text/csv body', async ({ qm }) => {
    const csv = csvOf(',BLIND RIVET - STRUCTURAL,,Dome,5056,Steel,-5,-3,,each,100,$0.14,,0', ',blind rivet – general purpose,,large flange,aluminum,aluminium,3/32 in,1,,each,100,0.05,,0', ',Solid rivet,,Universal head,2117-T4,,4,,6,each,100,0.03,,0');
    const res = await qm.agent.post('/api/bins/import/preview').set('X-CSRF-Token', qm.csrf).type('text/csv').send(csv);
    expect(res.status).toBe(200);
    const preview = importPreviewSchema.parse(res.body);
    expect(preview.rows.map((r) => r.errors)).toEqual([[], [], []]);
    // Grip -3 covers 0.126–0.187 in, -1 covers 0.020–0.062 in: TM 10-5410-221-14/1 Table 4-3.
    expect(preview.rows.map((r) => r.designation)).toEqual([
      'Blind, structural, dome, 5056, steel stem · 5/32 in · grip −3 (0.126–0.187 in)',
      'Blind, general purpose, large flange, aluminium, aluminium stem · 3/32 in · grip −1 (0.020–0.062 in)',
      // The head as the bin form words it for a solid rivet; MS20470AD4-6 (AC 43.13-1B para 4-57a).
      'MS20470AD4-6',
    ]);
  });

  test('flags an empty file, a header without bins, unknown and missing columns, and cells that are not numbers', async ({ qm }) => {
    const empty = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: ' \r\n' })).body);
    expect(empty).toMatchObject({ rows: [], canImport: false, fileErrors: [{ column: '', message: expect.stringContaining('The file is empty') }] });

    const headerOnly = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: HEADER })).body);
    expect(headerOnly.fileErrors.map((e) => e.message)).toEqual(['The file has a header line but no bins below it.']);

    const odd = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: 'Name,Colour,Pack size\nRivet tray,red,ten\n' })).body);
    expect(odd.columns).toEqual(['name', 'colour', 'pack_size']);
    expect(odd.fileErrors).toEqual([
      { column: 'colour', message: 'Line 1, column "colour" is not one Gripline knows. Rename it to a column of the template, or delete it.' },
      { column: 'kind', message: 'Line 1: the header has no "kind" column; every bin needs one.' },
    ]);
    expect(odd.rows[0]!.errors).toContainEqual({ column: 'pack_size', message: 'Line 2, pack_size: enter a number, not "ten".' });
    expect(odd.canImport).toBe(false);
  });

  test('numbers the lines of a long file right, with quoted cells over two lines all through it', async ({ qm }) => {
    // Long enough to be read in several pieces; every note spans two lines, so bin k starts on line 2 + 2k.
    const rows = Array.from({ length: 1200 }, (_, k) => `,screw,"Screw #8-32 × ${k + 1}/64, ""pan"" head",,,,,,,each,50,${k === 777 ? 'cheap' : '0.09'},"Top shelf,\nleft bin ${k}",10`);
    const preview = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: csvOf(...rows) })).body);
    expect(csvOf(...rows).length).toBeGreaterThan(100_000);
    expect(preview.rows).toHaveLength(1200);
    expect(preview.rows.every((r, k) => r.line === 2 + 2 * k)).toBe(true);
    expect(preview.rows[1199]!.designation).toBe('Screw #8-32 × 1200/64, "pan" head');
    expect(preview.rows[777]!.errors).toEqual([{ column: 'unit_cost', message: 'Line 1556, unit_cost: enter a number, not "cheap".' }]);
  });

  test('takes a file larger than the API’s usual body limit, refuses one over 2 MB, and is for the quartermaster only', async ({ lead, qm, member }) => {
    const many = csvOf(...Array.from({ length: 1500 }, (_, i) => `,screw,Screw #8-32 × ${i + 1}/16 pan head stainless,,,,,,,each,50,0.09,,10`));
    expect(many.length).toBeGreaterThan(100_000);
    const big = await post(qm, '/api/bins/import/preview', { csv: many });
    expect(big.status).toBe(200);
    expect(importPreviewSchema.parse(big.body)).toMatchObject({ counts: { new: 1500, problem: 0 }, canImport: true });
    expect(big.body.rows[1499]).toMatchObject({ line: 1501, code: 'B-1500' });

    const tooBig = await post(qm, '/api/bins/import/preview', { csv: 'x'.repeat(2_000_001) });
    expect(tooBig.status).toBe(400);
    expect(errorEnvelopeSchema.parse(tooBig.body).error.code).toBe('VALIDATION_FAILED');

    const refused = await post(member, '/api/bins/import/preview', { csv: csvOf(GOOD_BLIND) });
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('FORBIDDEN');
    expect((await post(lead, '/api/bins/import/preview', { csv: csvOf(GOOD_BLIND) })).status).toBe(200);
    // Paths the CSV router does not know still reach the bins router, for members too.
    expect((await member.agent.get('/api/bins')).status).toBe(200);
  });
});

describe('POST /api/bins/import', () => {
  // Solid rivet heads: MS20470 universal and MS20426 100° countersunk (AC 43.13-1B para 4-57a; NAVEDTRA 14315 Table 3-1).
  test('refuses a solid rivet row with a large flange head, naming the head column in words', async ({ qm, binCount }) => {
    const before = await binCount();
    const res = await post(qm, '/api/bins/import', { csv: csvOf(GOOD_BLIND, ',Solid rivet,,Large flange,2117-T4,,4,,6,each,100,0.03,,0') });
    expect(res.status).toBe(400);
    expect(errorEnvelopeSchema.parse(res.body).error.issues).toEqual([
      { path: 'line 3.head', message: 'Line 3, head: a solid rivet’s head is universal or 100° countersunk; large flange is a blind-rivet head.' },
    ]);
    expect(await binCount()).toBe(before);
  });

  test('refuses the whole file when one row is bad, and writes nothing', async ({ qm, binCount }) => {
    await addBinAs(qm, blindRivetBin());
    const before = await binCount();
    const res = await post(qm, '/api/bins/import', { csv: csvOf(GOOD_BLIND, GOOD_SCREW, ',blind_structural,,dome,5056,steel,4,7,,each,1,0.1,,10') });
    expect(res.status).toBe(400);
    const { error } = errorEnvelopeSchema.parse(res.body);
    expect(error.code).toBe('IMPORT_INVALID');
    expect(error.message).toBe('Nothing was imported: 1 of 3 rows have problems. Fix them and check the file again.');
    expect(error.issues).toEqual([{ path: 'line 4.grip_dash', message: 'Line 4, grip_dash: use a grip dash from the table: 1 to 6, or 8.' }]);
    expect(await binCount()).toBe(before);
    expect((await qm.agent.get('/api/bins/B-0002')).status).toBe(404);

    const empty = await post(qm, '/api/bins/import', { csv: '' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.issues[0].path).toBe('file');
  });

  test('creates every bin in one go, with its opening stock as the first ledger entry', async ({ qm, binCount }) => {
    await addBinAs(qm, blindRivetBin());
    const res = await post(qm, '/api/bins/import', { csv: csvOf(GOOD_BLIND, 'B-0050' + GOOD_SCREW) });
    expect(res.status).toBe(201);
    expect(importResultSchema.strict().parse(res.body)).toEqual({ created: ['B-0002', 'B-0050'], updated: [], unchanged: 0 });

    const blind = await qm.agent.get('/api/bins/B-0002');
    expect(blind.body).toMatchObject({ onHand: 500, unitCost: 0.12, packSize: 100, designation: 'Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)' });
    const ledger = await qm.agent.get('/api/bins/B-0050/ledger');
    expect(ledger.body.data).toEqual([expect.objectContaining({ kind: 'receive', quantity: 120, balanceAfter: 120, note: 'Opening stock', actor: expect.objectContaining({ name: 'Quinn Quartermaster' }) })]);
    expect(await binCount()).toBe(3);

    // The same file again: the row with a code finds its bin unchanged; the row without one would be a second bin of B-0002.
    const again = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: csvOf(GOOD_BLIND, 'B-0050' + GOOD_SCREW) })).body);
    expect(again.rows.map((r) => [r.code, r.status, r.warnings.length])).toEqual([
      ['B-0051', 'new', 1],
      ['B-0050', 'unchanged', 0],
    ]);
    expect(await binCount()).toBe(3);
  });
});

describe('GET /api/bins/export.csv', () => {
  test('exports every bin so that the file imports into an empty crib with the same designations and stock', async ({ t, qm, member }) => {
    await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    await addBinAs(qm, { kind: 'solid_rivet', head: 'countersunk', material: '2117-T4', diameter32: 4, length16: 3.5, unitCost: 0.0275, initialQuantity: 300, location: 'Drawer D1' });
    await addBinAs(qm, { kind: 'drill_bit', name: 'Drill #40 jobber, cobalt', drillSize: '#40', unit: 'each', unitCost: 2.5, initialQuantity: 12, notes: 'Keep dry.\nOne box "spare", opened' });
    await addBinAs(qm, { code: 'B-0200', kind: 'sealant_primer', name: '-Sealant, two-part, 6 oz', supplierPart: '+SP-6', unit: 'tube', initialQuantity: 4 });
    expect((await post(member, '/api/bins/B-0001/draw', { quantity: 120 })).status).toBe(201);

    const res = await qm.agent.get('/api/bins/export.csv');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename="gripline-bins-2026-12-01.csv"');
    writeChapterTimeZone(t.db, 'Pacific/Auckland'); // 12:00 UTC is already 01:00 on Wednesday there
    expect((await qm.agent.get('/api/bins/export.csv')).headers['content-disposition']).toBe('attachment; filename="gripline-bins-2026-12-02.csv"');
    const rows = records(res.text);
    expect(rows.map((r) => r.code)).toEqual(['B-0001', 'B-0002', 'B-0003', 'B-0200']);
    // MS20426AD4-3.5: 100° countersunk, 2117-T4, 1/8 in, half length written .5 (AC 43.13-1B para 4-57a).
    expect(rows[1]).toMatchObject({ designation: 'MS20426AD4-3.5', length_16ths: '3.5', unit_cost: '0.0275', on_hand: '300', opening_stock: '300' });
    expect(rows[0]).toMatchObject({ on_hand: '380', opening_stock: '380', grip_dash: '2', diameter_32nds: '4' });
    expect(rows[3]).toMatchObject({ name: "'-Sealant, two-part, 6 oz", supplier_part: "'+SP-6" });

    const before = (await qm.agent.get('/api/bins')).body.data as Record<string, unknown>[];
    const fresh = await buildTestApp();
    try {
      await fresh.addCrew();
      const freshQm = await fresh.signIn('qm@example.org');
      const imported = await post(freshQm, '/api/bins/import', { csv: res.text });
      expect(imported.status).toBe(201);
      expect(imported.body.created).toEqual(['B-0001', 'B-0002', 'B-0003', 'B-0200']);
      const after = (await freshQm.agent.get('/api/bins')).body.data as Record<string, unknown>[];
      const same = (bins: Record<string, unknown>[]) => bins.map(({ id: _id, lastCountedAt: _counted, ...rest }) => rest);
      expect(same(after)).toEqual(same(before));
      expect(after.map((b) => b.designation)).toEqual(before.map((b) => b.designation));
    } finally {
      await fresh.close();
    }
  });

  test('gives a monel solid rivet bin a plain description and no MS number, on its page and in the file', async ({ qm }) => {
    // MS20470 and MS20426 designate aluminium-alloy rivets only: material codes A, AD, D, DD, B (trade-checks.md §4).
    const bin = await addBinAs(qm, { kind: 'solid_rivet', head: 'dome', material: 'monel', diameter32: 4, length16: 6, unitCost: 0.09, initialQuantity: 100 });
    const plain = 'Solid, universal head, monel · 1/8 in · 3/8 in long';
    expect((await qm.agent.get(`/api/bins/${bin.code}`)).body).toMatchObject({ designation: plain });
    expect(records((await qm.agent.get('/api/bins/export.csv')).text)[0]).toMatchObject({ code: bin.code, designation: plain });
  });

  test('is for the quartermaster and the lead only, as are the import and its template', async ({ t, lead, member, binCount }) => {
    expect((await member.agent.get('/api/bins/export.csv')).status).toBe(403);
    expect((await member.agent.get('/api/bins/import/template.csv')).status).toBe(403);
    expect((await post(member, '/api/bins/import', { csv: csvOf(GOOD_BLIND) })).status).toBe(403);
    expect((await (await t.anonymous()).agent.get('/api/bins/export.csv')).status).toBe(401);
    expect(await binCount()).toBe(0);
    expect((await lead.agent.get('/api/bins/export.csv')).status).toBe(200);
  });
});

describe('GET /api/bins/ledger.csv', () => {
  test('lists every entry of the days asked for, both ends included, oldest first', async ({ t, qm, member, at }) => {
    at('2026-11-28T23:59:59.999Z');
    giveAssemblies(t.db, findUserByEmail(t.db, 'member@example.org')!.id, [7], { build: 'Two-seat kit', assemblies: { 7: 'Left aileron' } });
    await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    at('2026-11-29T00:00:00.000Z');
    await post(member, '/api/bins/B-0001/draw', { quantity: 20, note: 'left flap' });
    at('2026-11-30T13:30:00.000Z');
    await post(qm, '/api/bins/B-0001/receive', { quantity: 100, unitCost: 0.13 });
    at('2026-11-30T23:59:59.999Z');
    await post(member, '/api/bins/B-0001/draw', { quantity: 5, assemblyId: 7, note: '=cmd|" /C calc"!A0' });
    at('2026-12-01T00:00:00.000Z');
    await post(member, '/api/bins/B-0001/draw', { quantity: 1 });

    const res = await qm.agent.get('/api/bins/ledger.csv?from=2026-11-29&to=2026-11-30');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename="gripline-ledger-2026-11-29-to-2026-11-30.csv"');
    const rows = records(res.text);
    expect(rows.map((r) => [r.at, r.kind, r.quantity, r.balance_after])).toEqual([
      ['2026-11-29T00:00:00.000Z', 'draw', '-20', '480'],
      ['2026-11-30T13:30:00.000Z', 'receive', '100', '580'],
      ['2026-11-30T23:59:59.999Z', 'draw', '-5', '575'],
    ]);
    expect(rows[0]).toMatchObject({ bin_code: 'B-0001', designation: 'Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)', unit_cost: '0.12', value: '-2.40', by: 'Mia Member', for_member: 'Mia Member', note: 'left flap', reverses_id: '' });
    // A note that a spreadsheet would run as a formula stays text.
    expect(rows[2]).toMatchObject({ note: `'=cmd|" /C calc"!A0`, assembly_id: '7', assembly: 'Left aileron', build: 'Two-seat kit', value: '-0.65', unit_cost: '0.13' });
    expect(rows[0]).toMatchObject({ assembly_id: '', assembly: '', build: '' });

    const day = records((await qm.agent.get('/api/bins/ledger.csv?from=2026-11-28&to=2026-11-28')).text);
    expect(day.map((r) => r.note)).toEqual(['Opening stock']);
  });

  test('answers 400 when the start is after the end or a date is malformed', async ({ qm, member }) => {
    const reversed = await qm.agent.get('/api/bins/ledger.csv?from=2026-12-01&to=2026-11-01');
    expect(reversed.status).toBe(400);
    expect(reversed.body.error).toMatchObject({ code: 'VALIDATION_FAILED', issues: [{ path: 'to', message: 'The end date is before the start date: swap them.' }] });
    for (const query of ['from=2026-13-01&to=2026-12-01', 'from=yesterday&to=2026-12-01', 'from=2026-11-01']) {
      const res = await qm.agent.get(`/api/bins/ledger.csv?${query}`);
      expect(res.status, query).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
    }
    expect((await member.agent.get('/api/bins/ledger.csv?from=2026-11-01&to=2026-11-30')).status).toBe(403);
  });
});

describe('GET /api/bins/import/template.csv', () => {
  test('serves a header and two example rows that preview as valid', async ({ qm }) => {
    const res = await qm.agent.get('/api/bins/import/template.csv');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    const preview = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: res.text })).body);
    expect(preview).toMatchObject({ counts: { new: 2, problem: 0 }, canImport: true });
    expect(preview.rows.map((r) => r.designation)).toEqual(['Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)', 'Screw #8-32 × 1/2 pan head, stainless']);
  });
});

describe('a CSV file that is not UTF-8', () => {
  // "Société Aéro" with é as the single Windows-1252 byte 0xE9, as an older spreadsheet saves it.
  const latin = (text: string) => Buffer.from(text, 'latin1');
  const screwRow = ',Screw,Screw #8-32 × 1/2 pan head,,,,,,,each,50,0.09,Société Aéro,120';

  test('is read as Windows-1252 when it plainly is, so accents arrive intact', async ({ qm }) => {
    const res = await qm.agent.post('/api/bins/import').set('X-CSRF-Token', qm.csrf).type('text/csv').send(latin(csvOf(screwRow)));
    expect(res.status).toBe(201);
    const bins = (await qm.agent.get('/api/bins')).body as { data: { name: string; notes: string }[] };
    expect(bins.data.map((b) => [b.name, b.notes])).toEqual([['Screw #8-32 × 1/2 pan head', 'Société Aéro']]);
  });

  test('is refused with 400 CSV_NOT_TEXT when it is neither UTF-8 nor Windows-1252, and nothing is created', async ({ qm, binCount }) => {
    const bytes = Buffer.concat([Buffer.from(csvOf(GOOD_BLIND), 'utf8'), Buffer.from([0x0d, 0x0a, 0x81, 0x2c, 0x00])]);
    const res = await qm.agent.post('/api/bins/import').set('X-CSRF-Token', qm.csrf).type('text/csv').send(bytes);
    expect(res.status).toBe(400);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('CSV_NOT_TEXT');
    expect(await binCount()).toBe(0);
  });

  test('is refused, naming the line, when its text was already mangled into replacement characters', async ({ qm }) => {
    const res = await post(qm, '/api/bins/import/preview', { csv: csvOf(GOOD_BLIND, screwRow.replace('Société', 'Soci\uFFFDt\uFFFD')) });
    expect(res.status).toBe(400);
    const { error } = errorEnvelopeSchema.parse(res.body);
    expect(error.code).toBe('CSV_NOT_UTF8');
    expect(error.message).toContain('Line 3');
  });
});

describe('re-importing bins by code', () => {

  test('reports every row of an untouched export as unchanged and writes nothing', async ({ qm, editedExport, twoBins }) => {
    await twoBins();
    const before = (await qm.agent.get('/api/bins')).body.data;
    const csv = await editedExport();
    const res = await post(qm, '/api/bins/import/preview', { csv });
    expect(res.status).toBe(200);
    const preview = importPreviewSchema.strict().parse(res.body);
    expect(preview.rows.map((r) => [r.line, r.code, r.status, r.changes, r.errors])).toEqual([
      [2, 'B-0001', 'unchanged', [], []],
      [3, 'B-0002', 'unchanged', [], []],
    ]);
    expect(preview.counts).toEqual({ new: 0, update: 0, unchanged: 2, problem: 0 });
    expect(preview.canImport).toBe(false);
    const res2 = await post(qm, '/api/bins/import', { csv });
    expect(res2.status).toBe(409);
    expect(errorEnvelopeSchema.parse(res2.body).error).toEqual({ code: 'NOTHING_TO_IMPORT', message: 'Nothing was imported: every row of the file already matches its bin.' });
    expect((await qm.agent.get('/api/bins')).body.data).toEqual(before);
  });

  test('updates the descriptive fields of bins named by code, shows each change old → new, and never moves stock', async ({ qm, binCount, editedExport, twoBins }) => {
    await twoBins();
    const csv = await editedExport((r) => {
      if (r.code === 'B-0001') Object.assign(r, { unit_cost: '0.15', location: 'Shelf B1', reorder_point: '250', opening_stock: '999', on_hand: '999' });
    });
    const preview = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv })).body);
    expect(preview.counts).toEqual({ new: 0, update: 1, unchanged: 1, problem: 0 });
    expect(preview.canImport).toBe(true);
    const row = preview.rows[0]!;
    expect(row).toMatchObject({ code: 'B-0001', status: 'update', errors: [] });
    expect(row.changes).toEqual([
      { column: 'unit_cost', from: '0.12', to: '0.15' },
      { column: 'reorder_point', from: '200', to: '250' },
      { column: 'location', from: 'Shelf A2', to: 'Shelf B1' },
    ]);
    expect(row.warnings).toEqual([
      {
        column: 'on_hand',
        message: 'Line 2, on_hand: the file says 999 on hand and the bin holds 480. Stock moves only through the ledger, so this is ignored: count the bin to correct it.',
      },
    ]);
    expect(await binCount()).toBe(2);
    expect((await qm.agent.get('/api/bins/B-0001')).body).toMatchObject({ unitCost: 0.12, location: 'Shelf A2' });

    const res = await post(qm, '/api/bins/import', { csv });
    expect(res.status).toBe(201);
    expect(importResultSchema.strict().parse(res.body)).toEqual({ created: [], updated: ['B-0001'], unchanged: 1 });
    const bin = (await qm.agent.get('/api/bins/B-0001')).body;
    expect(bin).toMatchObject({ unitCost: 0.15, location: 'Shelf B1', reorderPoint: 250, onHand: 480 });
    const ledger = (await qm.agent.get('/api/bins/B-0001/ledger')).body.data as { kind: string }[];
    expect(ledger.map((e) => e.kind)).toEqual(['draw', 'receive']);
  });

  test('keeps the values of columns the file leaves out, and checks the updated bin as a whole', async ({ qm, twoBins }) => {
    await twoBins();
    const counted = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: 'code,kind,on_hand,opening_stock\r\nB-0001,blind_structural,480,500' })).body);
    expect(counted.rows[0]).toMatchObject({ status: 'unchanged', warnings: [{ column: 'opening_stock', message: expect.stringContaining('the file says 500 on hand and the bin holds 480') }] });
    const moved = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: 'code,kind,location\r\nB-0001,blind_structural,Shelf C3\r\nB-0002,screw,Drawer C4' })).body);
    expect(moved.rows.map((r) => [r.status, r.changes])).toEqual([
      ['update', [{ column: 'location', from: 'Shelf A2', to: 'Shelf C3' }]],
      ['update', [{ column: 'location', from: '', to: 'Drawer C4' }]],
    ]);
    const broken = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: 'code,kind,grip_dash\r\nB-0001,blind_structural,' })).body);
    expect(broken.rows[0]).toMatchObject({ status: 'problem', errors: [{ column: 'grip_dash', message: 'Line 2, grip_dash: a blind rivet bin needs its grip dash, like 2 for 0.063–0.125 in.' }] });
    expect(broken.canImport).toBe(false);
  });

  test('warns, without refusing, when a new bin has the specification of a bin already in the crib', async ({ qm, twoBins }) => {
    await twoBins();
    const preview = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: csvOf(GOOD_BLIND, GOOD_SCREW.replace('Screw #8-32 × 1/2 pan head', 'screw #8-32 × 1/2 PAN HEAD')) })).body);
    expect(preview.rows.map((r) => [r.code, r.status, r.warnings.map((w) => w.message)])).toEqual([
      ['B-0003', 'new', ['Line 2: bin B-0001 already holds this (Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)). Import the row only if you mean a second bin of it.']],
      ['B-0004', 'new', ['Line 3: bin B-0002 already holds this (Screw #8-32 × 1/2 pan head). Import the row only if you mean a second bin of it.']],
    ]);
    expect(preview.canImport).toBe(true);
    expect((await post(qm, '/api/bins/import', { csv: csvOf(GOOD_BLIND) })).status).toBe(201);
  });

  test('reads the template and the export alike: the template imports, its bins export with the same columns and values, and read back unchanged', async ({ qm }) => {
    const template = (await qm.agent.get('/api/bins/import/template.csv')).text;
    const first = await post(qm, '/api/bins/import', { csv: template });
    expect(first.status).toBe(201);
    expect(first.body.created).toEqual(['B-0001', 'B-0002']);

    const exported = (await qm.agent.get('/api/bins/export.csv')).text;
    const header = (text: string) => Papa.parse<string[]>(text.replace(/^\uFEFF/, '')).data[0];
    expect(header(exported)).toEqual([...header(template)!, 'designation', 'on_hand']);
    // Every example value is written the way the export writes it (only the code is left empty).
    const withoutCode = ({ code: _code, designation: _d, on_hand: _o, ...rest }: Record<string, string>) => rest;
    expect(records(exported).map(withoutCode)).toEqual(records(template).map(withoutCode));

    const roundTrip = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: exported })).body);
    expect(roundTrip.rows.map((r) => [r.code, r.status])).toEqual([['B-0001', 'unchanged'], ['B-0002', 'unchanged']]);
    // The template again makes new bins, each with a warning naming the bin that already holds it.
    const twice = importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv: template })).body);
    expect(twice.rows.map((r) => [r.code, r.status, r.warnings.map((w) => w.message.match(/B-\d+/)?.[0])])).toEqual([
      ['B-0003', 'new', ['B-0001']],
      ['B-0004', 'new', ['B-0002']],
    ]);
  });
});
