import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { importPreviewSchema } from '@shared/schemas/bin-import';
import { binFieldsSchema, type BinFields } from '@shared/schemas/bins';
import { errorEnvelopeSchema } from '@shared/schemas/errors';
import { migrateDatabase } from '../../server/db/client';
import { findBinLabels } from '../../server/features/labels/labels.repo';
import { addBinAs, blindRivetBin, patch, post } from '../helpers/crib';
import { withDatabaseBefore } from '../helpers/migrations-before';
import { crewTest } from '../helpers/crew-test';

// Grip bands by dash from TM 10-5410-221-14/1 Table 4-3: −2 0.063–0.125 in, −3 0.126–0.187 in, −4 0.188–0.250 in.

const records = (text: string) => Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: true }).data;

const test = crewTest
  .extend('binOf', ({ qm }) => async (code: string): Promise<BinFields> => {
    const res = await qm.agent.get(`/api/bins/${code}`);
    expect(res.status).toBe(200);
    return binFieldsSchema.parse(res.body);
  })
  /** The quartermaster's bins export, each row passed through `edit`. */
  .extend('editedExport', ({ qm }) => async (edit: (r: Record<string, string>) => void = () => {}): Promise<string> => {
    const rows = records((await qm.agent.get('/api/bins/export.csv')).text);
    rows.forEach(edit);
    return Papa.unparse(rows, { newline: '\r\n' });
  })
  .extend('preview', ({ qm }) => async (csv: string) => importPreviewSchema.parse((await post(qm, '/api/bins/import/preview', { csv })).body));

function refused(res: { status: number; body: unknown }) {
  expect(res.status).toBe(400);
  return errorEnvelopeSchema.parse(res.body).error;
}

describe('a blind bin’s grip range', () => {
  test('defaults to the table’s band for its grip dash', async ({ qm, binOf }) => {
    const { code } = await addBinAs(qm, blindRivetBin());
    const bin = await binOf(code);
    // −2: 0.063–0.125 in (TM 10-5410-221-14/1 Table 4-3).
    expect([bin.gripMin, bin.gripMax]).toEqual([0.063, 0.125]);
    expect(bin.gripRange).toEqual({ min: 0.063, max: 0.125 });
    expect(bin.designation).toBe('Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)');
  });

  test('keeps the range from the box, to the thousandth, and shows it in the designation and on the label', async ({ t, qm, binOf }) => {
    // A maker's −3 box reading 0.0945–0.1875 in: kept to the table's 0.001 in as 0.095–0.188 (rounded half up).
    const { code } = await addBinAs(qm, blindRivetBin({ grip16: 3, gripMin: 0.0945, gripMax: 0.1875 }));
    const bin = await binOf(code);
    expect([bin.gripMin, bin.gripMax]).toEqual([0.095, 0.188]);
    expect(bin.designation).toBe('Blind, structural, dome, 5056, steel stem · 1/8 in · grip −3 (0.095–0.188 in)');
    expect(findBinLabels(t.db, [code]).get(code)?.title).toBe(bin.designation);
  });

  test('takes one end from the box and the other from the table', async ({ qm, binOf }) => {
    const { code } = await addBinAs(qm, blindRivetBin({ gripMax: 0.14 }));
    expect((await binOf(code)).gripRange).toEqual({ min: 0.063, max: 0.14 });
  });

  test('refuses with 400, naming the field, a minimum at or above the maximum', async ({ qm }) => {
    const error = refused(await post(qm, '/api/bins', blindRivetBin({ gripMin: 0.1, gripMax: 0.1 })));
    expect(error.code).toBe('VALIDATION_FAILED');
    expect(error.issues).toEqual([{ path: 'gripMax', message: 'The smallest grip (0.100 in) must be below the largest (0.100 in).' }]);
    // Only the minimum given, above the −2 band's maximum of 0.125 in.
    const alone = refused(await post(qm, '/api/bins', blindRivetBin({ gripMin: 0.13 })));
    expect(alone.issues).toEqual([{ path: 'gripMin', message: 'The smallest grip (0.130 in) must be below the largest (0.125 in).' }]);
  });

  test('refuses a range outside 0.010–1.000 in', async ({ qm }) => {
    for (const [field, value] of [['gripMin', 0.005], ['gripMax', 1.2], ['gripMin', -0.1]] as const) {
      const error = refused(await post(qm, '/api/bins', blindRivetBin({ [field]: value })));
      expect(error.issues).toEqual([{ path: field, message: 'A grip range lies between 0.010 and 1.000 in.' }]);
    }
    const text = refused(await post(qm, '/api/bins', blindRivetBin({ gripMax: '0.125' })));
    expect(text.issues).toEqual([{ path: 'gripMax', message: 'Enter the largest grip from the box in inches, like 0.125.' }]);
  });

  test('refuses a range wholly outside the dash’s band: another dash or a slip of the pen', async ({ qm }) => {
    // −2 is 0.063–0.125 in; 0.188–0.250 in is the −4 band.
    const error = refused(await post(qm, '/api/bins', blindRivetBin({ gripMin: 0.188, gripMax: 0.25 })));
    expect(error.issues).toEqual([
      { path: 'gripMin', message: 'The grip range 0.188–0.250 in is outside the −2 band (0.063–0.125 in): check the grip dash and the figures on the box.' },
    ]);
    // Sharing part of the band is a maker's own range, and is kept: 0.100–0.150 in on a −2 box.
    expect((await post(qm, '/api/bins', blindRivetBin({ gripMin: 0.1, gripMax: 0.15 }))).status).toBe(201);
  });

  test('refuses a range on a solid rivet or a bin that holds no rivets', async ({ qm, binOf }) => {
    const solid = { kind: 'solid_rivet', head: 'dome', material: '2117-T4', diameter32: 4, length16: 6, gripMin: 0.063 };
    expect((refused(await post(qm, '/api/bins', solid))).issues).toEqual([
      { path: 'gripMin', message: 'Solid rivets are sized by length: only blind rivet bins carry a grip range. Leave it empty.' },
    ]);
    const screw = { kind: 'screw', name: 'Screw #8-32 × 1/2 pan head', gripMax: 0.125 };
    expect((refused(await post(qm, '/api/bins', screw))).issues).toEqual([
      { path: 'gripMax', message: 'Only rivet bins carry a fastener spec; leave it empty or choose a rivet kind.' },
    ]);
    const { code } = await addBinAs(qm, { ...solid, gripMin: null });
    expect(await binOf(code)).toMatchObject({ gripMin: null, gripMax: null, gripRange: null });
  });

  test('on an edit: keeps the range unless the dash changes, when it takes the new dash’s band; null goes back to the table', async ({ qm, binOf }) => {
    const { code } = await addBinAs(qm, blindRivetBin({ gripMin: 0.07, gripMax: 0.13 }));
    expect((await patch(qm, `/api/bins/${code}`, { location: 'Shelf B1' })).status).toBe(200);
    expect((await binOf(code)).gripRange).toEqual({ min: 0.07, max: 0.13 });

    expect((await patch(qm, `/api/bins/${code}`, { gripMax: 0.12 })).status).toBe(200);
    expect((await binOf(code)).gripRange).toEqual({ min: 0.07, max: 0.12 });

    // −4: 0.188–0.250 in.
    expect((await patch(qm, `/api/bins/${code}`, { grip16: 4 })).status).toBe(200);
    expect((await binOf(code)).gripRange).toEqual({ min: 0.188, max: 0.25 });

    expect((await patch(qm, `/api/bins/${code}`, { gripMin: 0.2 })).status).toBe(200);
    expect((await patch(qm, `/api/bins/${code}`, { gripMin: null })).status).toBe(200);
    expect((await binOf(code)).gripRange).toEqual({ min: 0.188, max: 0.25 });

    const error = refused(await patch(qm, `/api/bins/${code}`, { gripMax: 0.15 }));
    expect(error.issues).toEqual([{ path: 'gripMax', message: 'The smallest grip (0.188 in) must be below the largest (0.150 in).' }]);

    // A blind bin made a solid one leaves its range behind.
    expect((await patch(qm, `/api/bins/${code}`, { kind: 'solid_rivet', grip16: null, stemMaterial: null, length16: 6, material: '2117-T4' })).status).toBe(200);
    expect(await binOf(code)).toMatchObject({ gripMin: null, gripMax: null, gripRange: null });
  });
});

describe('the grip range in the bins CSV', () => {
  test('exports the two columns, and an untouched export reads back unchanged, row by row', async ({ qm, editedExport, preview }) => {
    await addBinAs(qm, blindRivetBin());
    await addBinAs(qm, blindRivetBin({ grip16: 3, gripMin: 0.095, gripMax: 0.188 }));
    await addBinAs(qm, { kind: 'solid_rivet', head: 'dome', material: '2117-T4', diameter32: 4, length16: 6 });
    const rows = records((await qm.agent.get('/api/bins/export.csv')).text);
    expect(rows.map((r) => [r.code, r.grip_dash, r.grip_min_in, r.grip_max_in])).toEqual([
      ['B-0001', '2', '0.063', '0.125'],
      ['B-0002', '3', '0.095', '0.188'],
      ['B-0003', '', '', ''],
    ]);
    const p = await preview(await editedExport());
    expect(p.rows.map((r) => [r.code, r.status, r.changes, r.errors])).toEqual([
      ['B-0001', 'unchanged', [], []],
      ['B-0002', 'unchanged', [], []],
      ['B-0003', 'unchanged', [], []],
    ]);
  });

  test('updates a range from the file, with its unit written or not, and refuses one outside the band', async ({ qm, binOf, editedExport, preview }) => {
    await addBinAs(qm, blindRivetBin());
    const p = await preview(
      await editedExport((r) => {
        r.grip_min_in = '0.070 in';
        r.grip_max_in = '0.135"';
      }),
    );
    expect(p.rows[0]).toMatchObject({
      status: 'update',
      changes: [
        { column: 'grip_min_in', from: '0.063', to: '0.07' },
        { column: 'grip_max_in', from: '0.125', to: '0.135' },
      ],
    });
    expect((await post(qm, '/api/bins/import', { csv: await editedExport((r) => (r.grip_max_in = '0.135')) })).status).toBe(201);
    expect((await binOf('B-0001')).gripRange).toEqual({ min: 0.063, max: 0.135 });

    const bad = await preview(await editedExport((r) => ((r.grip_min_in = '0.2'), (r.grip_max_in = '0.25'))));
    expect(bad.rows[0]).toMatchObject({
      status: 'problem',
      errors: [{ column: 'grip_min_in', message: 'Line 2, grip_min_in: the grip range 0.200–0.250 in is outside the −2 band (0.063–0.125 in): check the grip dash and the figures on the box.' }],
    });
  });

  test('gives a new dash the table’s band when the file has no range columns, and empty cells the table’s band', async ({ qm, preview }) => {
    await addBinAs(qm, blindRivetBin({ gripMin: 0.07, gripMax: 0.13 }));
    // An older file without the range columns moves the bin to −3: its range becomes the −3 band, 0.126–0.187 in.
    const old = await preview('code,kind,grip_dash\r\nB-0001,blind_structural,3');
    expect(old.rows[0]).toMatchObject({
      status: 'update',
      changes: [
        { column: 'grip_dash', from: '2', to: '3' },
        { column: 'grip_min_in', from: '0.07', to: '0.126' },
        { column: 'grip_max_in', from: '0.13', to: '0.187' },
      ],
    });
    const cleared = await preview('code,kind,grip_min_in,grip_max_in\r\nB-0001,blind_structural,,');
    expect(cleared.rows[0]!.changes).toEqual([
      { column: 'grip_min_in', from: '0.07', to: '0.063' },
      { column: 'grip_max_in', from: '0.13', to: '0.125' },
    ]);
    const kept = await preview('code,kind,location\r\nB-0001,blind_structural,Shelf B1');
    expect(kept.rows[0]!.changes).toEqual([{ column: 'location', from: 'Shelf A2', to: 'Shelf B1' }]);
  });

  test('new rows take the table’s band, or the file’s range', async ({ preview }) => {
    const p = await preview('kind,head,material,diameter_32nds,grip_dash,grip_min_in,grip_max_in\r\nblind_structural,dome,5056,4,2,,\r\nblind_structural,dome,5056,4,2,.07,.13');
    expect(p.rows.map((r) => [r.status, r.designation])).toEqual([
      ['new', 'Blind, structural, dome, 5056 · 1/8 in · grip −2 (0.063–0.125 in)'],
      ['new', 'Blind, structural, dome, 5056 · 1/8 in · grip −2 (0.070–0.130 in)'],
    ]);
  });
});

describe('migration bin_grip_range', () => {
  it('gives blind bins stocked before it the table’s band for their dash, and other bins none', () => {
    withDatabaseBefore('_bin_grip_range', (db) => {
      const insert = db.$client.prepare('insert into bins (code, kind, head, material, diameter32, grip16, length16, name) values (?, ?, ?, ?, ?, ?, ?, ?)');
      insert.run('B-0001', 'blind_structural', 'dome', '5056', 4, 1, null, '');
      insert.run('B-0002', 'blind_general', 'dome', 'aluminium', 4, 8, null, '');
      insert.run('B-0003', 'solid_rivet', 'dome', '2117-T4', 4, null, 6, '');
      insert.run('B-0004', 'screw', null, null, null, null, null, 'Screw');
      migrateDatabase(db);
      const rows = db.$client.prepare('select code, grip_min, grip_max from bins order by code').all();
      // −1: 0.020–0.062 in; −8: 0.376–0.500 in (TM 10-5410-221-14/1 Table 4-3).
      expect(rows).toEqual([
        { code: 'B-0001', grip_min: 0.02, grip_max: 0.062 },
        { code: 'B-0002', grip_min: 0.376, grip_max: 0.5 },
        { code: 'B-0003', grip_min: null, grip_max: null },
        { code: 'B-0004', grip_min: null, grip_max: null },
      ]);
    });
  });
});
