import { describe, expect } from 'vitest';
import { sheetLayoutListSchema } from '@shared/schemas/labels';
import { findSheetLayout } from '../../labels/layouts';
import { pageSizeInPoints } from '../../labels/sheet-geometry';
import { tools } from '../../server/db/schema/tools';
import { addBinAs, blindRivetBin } from '../helpers/crib';
import { pdfPageCount, pdfRects, pdfStreams, shownText } from '../helpers/pdf-read';
import { decodeQrPng, rectsToPng } from '../helpers/qr-raster';
import { crewTest } from '../helpers/crew-test';
import { postSheet } from '../helpers/label-sheet';

const code = (n: number) => `T-${String(n).padStart(4, '0')}`;

const test = crewTest.extend('addTools', ({ t }) => (count: number, name = (n: number) => `Hand rivet puller ${n}`) => {
  t.db
    .insert(tools)
    .values(Array.from({ length: count }, (_, i) => ({ code: code(i + 1), name: name(i + 1), category: 'hand_rivet_puller' as const })))
    .run();
});

const textOf = (pdf: Buffer) => pdfStreams(pdf).flatMap(shownText);

describe('GET /api/labels/layouts', () => {
  test('lists the sheet layouts to a quartermaster and to a lead', async ({ lead, qm }) => {
    for (const who of [qm, lead]) {
      const res = await who.agent.get('/api/labels/layouts');
      expect(res.status).toBe(200);
      const { data } = sheetLayoutListSchema.parse(res.body);
      expect(data.map((l) => l.id)).toEqual(['letter-3x10-2.625x1in', 'a4-3x8-70x37mm', 'thermal-1x1-2x1in']);
    }
  });

  test('answers 403 FORBIDDEN to a member', async ({ member }) => {
    const res = await member.agent.get('/api/labels/layouts');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('FORBIDDEN');
  });

  test('answers 401 NOT_SIGNED_IN when signed out', async ({ t }) => {
    const { agent } = await t.anonymous();
    const res = await agent.get('/api/labels/layouts');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });
});

describe('POST /api/labels/sheet', () => {
  test('answers a PDF download with every requested code and tool name', async ({ qm, addTools }) => {
    addTools(3, (n) => ['Pneumatic rivet puller', 'Air drill, 90 degree', 'Bucking bar, 1 lb'][n - 1]!);
    const res = await postSheet(qm, { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001', 'T-0002', 'T-0003'] });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe('attachment; filename="gripline-labels-letter-3x10-2.625x1in.pdf"');
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdfPageCount(pdf)).toBe(1);
    expect(textOf(pdf)).toEqual(['T-0001', 'Pneumatic rivet puller', 'T-0002', 'Air drill, 90 degree', 'T-0003', 'Bucking bar, 1 lb']);
  });

  test('lets a lead print labels too', async ({ lead, addTools }) => {
    addTools(1);
    const res = await postSheet(lead, { layoutId: 'a4-3x8-70x37mm', codes: ['T-0001'] });
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toBe('attachment; filename="gripline-labels-a4-3x8-70x37mm.pdf"');
  });

  test.for<[string, string, number, number, number]>([
    ['30 labels fill one Letter page', 'letter-3x10-2.625x1in', 30, 0, 1],
    ['31 labels need a second page', 'letter-3x10-2.625x1in', 31, 0, 2],
    ['25 labels after 5 used ones still fit one page', 'letter-3x10-2.625x1in', 25, 5, 1],
    ['26 labels after 5 used ones spill onto a second page', 'letter-3x10-2.625x1in', 26, 5, 2],
    ['24 labels after 23 used ones take two A4 pages', 'a4-3x8-70x37mm', 24, 23, 2],
    ['a thermal roll prints one label per page', 'thermal-1x1-2x1in', 4, 0, 4],
  ])('pages: %s', async ([_name, layoutId, count, skip, pages], { qm, addTools }) => {
    addTools(count);
    const codes = Array.from({ length: count }, (_, i) => code(i + 1));
    const res = await postSheet(qm, { layoutId, codes, skip });
    expect(res.status).toBe(200);
    const pdf = res.body as Buffer;
    expect(pdfPageCount(pdf)).toBe(pages);
    const text = textOf(pdf);
    for (const c of codes) expect(text).toContain(c);
  });

  test('prints a label for each time a code is listed, and reads codes in any case', async ({ qm, addTools }) => {
    addTools(2);
    const res = await postSheet(qm, { layoutId: 'letter-3x10-2.625x1in', codes: ['t-0001', ' T-0002 ', 'T-0001'] });
    expect(res.status).toBe(200);
    expect(textOf(res.body as Buffer).filter((s) => s.startsWith('T-'))).toEqual(['T-0001', 'T-0002', 'T-0001']);
  });

  test('answers 400 UNKNOWN_CODES naming every code no tool has', async ({ qm, addTools }) => {
    addTools(1);
    const res = await postSheet(qm, { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001', 'T-0404', 'T-0500', 'T-0404'] });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('UNKNOWN_CODES');
    expect(res.body.error.message).toBe('No tool has the codes T-0404 and T-0500. Take them off the list or check the code.');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['codes.1', 'codes.2', 'codes.3']);
  });

  test('answers 400 for a layout that does not exist', async ({ qm, addTools }) => {
    addTools(1);
    const res = await postSheet(qm, { layoutId: 'letter-99x99', codes: ['T-0001'] });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.issues[0].path).toBe('layoutId');
    expect(res.body.error.message).toMatch(/letter-3x10-2\.625x1in/);
  });

  test('answers 400 when more labels are said to be used than a page has', async ({ qm, addTools }) => {
    addTools(1);
    const thermal = await postSheet(qm, { layoutId: 'thermal-1x1-2x1in', codes: ['T-0001'], skip: 1 });
    expect(thermal.status).toBe(400);
    expect(thermal.body.error.code).toBe('VALIDATION_FAILED');
    expect(thermal.body.error.issues).toEqual([{ path: 'skip', message: 'A page of this layout has 1 label, so at most 0 can be already used.' }]);
    const letter = await postSheet(qm, { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001'], skip: 30 });
    expect(letter.status).toBe(400);
    expect(letter.body.error.issues[0].path).toBe('skip');
    expect((await postSheet(qm, { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001'], skip: 29 })).status).toBe(200);
  });

  test.for([
    ['no codes', { layoutId: 'letter-3x10-2.625x1in', codes: [] }, 'codes'],
    ['more than 300 codes', { layoutId: 'letter-3x10-2.625x1in', codes: Array.from({ length: 301 }, (_, i) => code(i + 1)) }, 'codes'],
    ['a code that is not a tool code', { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001', 'drill'] }, 'codes.1'],
    ['codes that are not a list', { layoutId: 'letter-3x10-2.625x1in', codes: 'T-0001' }, 'codes'],
    ['no layout', { codes: ['T-0001'] }, 'layoutId'],
    ['a negative skip', { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001'], skip: -1 }, 'skip'],
    ['a fractional skip', { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001'], skip: 1.5 }, 'skip'],
    ['an unknown field', { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001'], copies: 2 }, 'copies'],
  ])('answers 400 VALIDATION_FAILED for %s', async ([_name, body, path], { qm, addTools }) => {
    addTools(1);
    const res = await postSheet(qm, body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
    expect(res.body.error.message.length).toBeGreaterThan(10);
  });

  test('answers 403 FORBIDDEN to a member and 401 NOT_SIGNED_IN when signed out', async ({ t, member, addTools }) => {
    addTools(1);
    const body = { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001'] };
    const refused = await postSheet(member, body);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('FORBIDDEN');
    const anonymous = await postSheet(await t.anonymous(), body);
    expect(anonymous.status).toBe(401);
    expect(anonymous.body.error.code).toBe('NOT_SIGNED_IN');
  });
});

describe('POST /api/labels/sheet with bin codes', () => {
  /** MS20470AD4-6: universal head, 2117-T4, 1/8 in, 3/8 in long (AC 43.13-1B para 4-57a decoding example). */
  const solidRivetBin = { kind: 'solid_rivet', head: 'dome', material: '2117-T4', diameter32: 4, length16: 6, packSize: 1000, unitCost: 0.021 };
  const screwBin = { kind: 'screw', name: 'Screw #8-32 × 1/2 pan head, stainless', packSize: 100, unitCost: 0.18 };

  test('prints a bin label with its code and designation, and its QR reads back as the bin code', async ({ qm }) => {
    const bin = await addBinAs(qm, solidRivetBin);
    const res = await postSheet(qm, { layoutId: 'thermal-1x1-2x1in', codes: [bin.code] });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    expect(textOf(pdf)).toEqual([bin.code, 'MS20470AD4-6']);
    const page = pageSizeInPoints(findSheetLayout('thermal-1x1-2x1in')!);
    const [content] = pdfStreams(pdf).filter((s) => pdfRects(s).length > 0);
    expect(decodeQrPng(rectsToPng(page.width, page.height, pdfRects(content!), 8))).toBe(bin.code);
  });

  test('titles a blind rivet bin with its readable designation and grip range, and other bins with their name', async ({ qm }) => {
    const blind = await addBinAs(qm, blindRivetBin());
    const screw = await addBinAs(qm, screwBin);
    const res = await postSheet(qm, { layoutId: 'a4-3x8-70x37mm', codes: [blind.code, screw.code] });
    expect(res.status).toBe(200);
    const text = textOf(res.body as Buffer);
    const at = (code: string) => text.indexOf(code);
    // Grip dash -2 covers 0.063–0.125 in (TM 10-5410-221-14/1 Table 4-3); the minus prints as a hyphen.
    expect(text.slice(at(blind.code) + 1, at(screw.code)).join(' ')).toBe('Blind, structural, dome, 5056, steel stem · 1/8 in · grip -2 (0.063–0.125 in)');
    expect(text.slice(at(screw.code) + 1).join(' ')).toBe('Screw #8-32 × 1/2 pan head, stainless');
  });

  test('prints a general-purpose blind rivet bin label with its whole grip range and "Not for structure" on every layout', async ({ qm }) => {
    // Grip dash -1 covers 0.020–0.062 in (TM 10-5410-221-14/1 Table 4-3); general-purpose pull-type blind rivets
    // are not approved for aircraft structure (AC 43.13-1B p. 4-24).
    const bin = await addBinAs(qm, blindRivetBin({ kind: 'blind_general', material: 'aluminium', grip16: 1 }));
    for (const layoutId of ['letter-3x10-2.625x1in', 'a4-3x8-70x37mm', 'thermal-1x1-2x1in']) {
      const res = await postSheet(qm, { layoutId, codes: [bin.code] });
      expect(res.status).toBe(200);
      const text = textOf(res.body as Buffer);
      expect(text[0]).toBe(bin.code);
      expect(text.slice(1, -1).join(' ')).toBe('Blind, general purpose, dome, aluminium, steel stem · 1/8 in · grip -1 (0.020–0.062 in)');
      expect(text.at(-1)).toBe('Not for structure');
    }
  });

  test('puts no structure caution on a structural blind rivet or a solid rivet bin', async ({ qm }) => {
    const blind = await addBinAs(qm, blindRivetBin());
    const solid = await addBinAs(qm, solidRivetBin);
    const res = await postSheet(qm, { layoutId: 'letter-3x10-2.625x1in', codes: [blind.code, solid.code] });
    expect(res.status).toBe(200);
    expect(textOf(res.body as Buffer).join(' ')).not.toContain('structure');
  });

  test('prints tool and bin labels together, in the order given, each QR reading back as its code', async ({ qm, addTools }) => {
    addTools(2, (n) => ['Rivet gun', 'Air drill'][n - 1]!);
    const bin = await addBinAs(qm, solidRivetBin);
    const codes = ['T-0002', bin.code, 'T-0001'];
    const res = await postSheet(qm, { layoutId: 'thermal-1x1-2x1in', codes: codes.map((c) => c.toLowerCase()) });
    expect(res.status).toBe(200);
    const pdf = res.body as Buffer;
    expect(pdfPageCount(pdf)).toBe(3);
    expect(textOf(pdf)).toEqual(['T-0002', 'Air drill', bin.code, 'MS20470AD4-6', 'T-0001', 'Rivet gun']);
    const page = pageSizeInPoints(findSheetLayout('thermal-1x1-2x1in')!);
    const pages = pdfStreams(pdf).filter((s) => pdfRects(s).length > 0);
    expect(pages.map((content) => decodeQrPng(rectsToPng(page.width, page.height, pdfRects(content), 8)))).toEqual(codes);
  });

  test('answers 400 UNKNOWN_CODES for a bin code no bin has', async ({ qm }) => {
    const bin = await addBinAs(qm, solidRivetBin);
    const res = await postSheet(qm, { layoutId: 'letter-3x10-2.625x1in', codes: [bin.code, 'B-0404'] });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('UNKNOWN_CODES');
    expect(res.body.error.message).toBe('No bin has the code B-0404. Take it off the list or check the code.');
    expect(res.body.error.issues).toEqual([{ path: 'codes.1', message: 'No bin has the code B-0404.' }]);
  });

  test('names tools and bins together when both kinds of code are unknown', async ({ qm, addTools }) => {
    addTools(1);
    const res = await postSheet(qm, { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001', 'B-0404', 'T-0404'] });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('UNKNOWN_CODES');
    expect(res.body.error.message).toBe('No tool or bin has the codes B-0404 and T-0404. Take them off the list or check the code.');
    expect(res.body.error.issues).toEqual([
      { path: 'codes.1', message: 'No bin has the code B-0404.' },
      { path: 'codes.2', message: 'No tool has the code T-0404.' },
    ]);
  });

  test.for([
    ['a code of neither kind', 'X-0001'],
    ['a bin code with too few digits', 'B-107'],
  ])('answers 400 VALIDATION_FAILED for %s', async ([_name, bad], { qm, addTools }) => {
    addTools(1);
    const res = await postSheet(qm, { layoutId: 'letter-3x10-2.625x1in', codes: ['T-0001', bad] });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain('codes.1');
  });
});
