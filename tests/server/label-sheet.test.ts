import { describe, expect, it } from 'vitest';
import { findSheetLayout } from '../../labels/layouts';
import { pageSizeInPoints } from '../../labels/sheet-geometry';
import { fitLines, toWinAnsi } from '../../server/features/labels/fit-text';
import { renderLabelSheet } from '../../server/features/labels/label-sheet.renderer';
import { darkRuns, QUIET_ZONE_MODULES, qrMatrix } from '../../server/features/labels/qr-matrix';
import { pdfPageCount, pdfRects, pdfStreams, shownText } from '../helpers/pdf-read';
import { decodeQrPng, rectsToPng } from '../helpers/qr-raster';

const CODES = ['T-0001', 'T-0042', 'T-9999', 'T-123456', 'B-0107'];

describe('qrMatrix', () => {
  it.each(CODES)('draws a QR that a scanner reads back as exactly %s', (code) => {
    const matrix = qrMatrix(code);
    const rects = darkRuns(matrix).map((r) => ({ x: r.column, y: r.row, width: r.length, height: 1 }));
    const png = rectsToPng(matrix.size, matrix.size, rects, 6);
    expect(decodeQrPng(png)).toBe(code);
  });

  it('leaves a quiet zone of 4 light modules on every side', () => {
    const matrix = qrMatrix('T-0042');
    expect(QUIET_ZONE_MODULES).toBe(4);
    // Version 1 is 21 modules a side (ISO/IEC 18004); with the quiet zone, 29.
    expect(matrix.size).toBe(21 + 2 * 4);
    for (let i = 0; i < matrix.size; i++) {
      for (let q = 0; q < 4; q++) {
        expect(matrix.isDark(q, i) || matrix.isDark(i, q) || matrix.isDark(matrix.size - 1 - q, i) || matrix.isDark(i, matrix.size - 1 - q)).toBe(false);
      }
    }
    expect(matrix.isDark(4, 4)).toBe(true);
  });
});

describe('renderLabelSheet', () => {
  it('draws QR squares in the PDF that read back as each label code', async () => {
    const thermal = findSheetLayout('thermal-1x1-2x1in')!;
    const items = CODES.map((code) => ({ code, title: `Item ${code}` }));
    const pdf = await renderLabelSheet(thermal, items, { compress: false });
    const pages = pdfStreams(pdf);
    expect(pdfPageCount(pdf)).toBe(CODES.length);
    const page = pageSizeInPoints(thermal);
    const read = pages.map((content) => decodeQrPng(rectsToPng(page.width, page.height, pdfRects(content), 8)));
    expect(read).toEqual(CODES);
  });

  it('prints each code once and the title shortened to fit', async () => {
    const letter = findSheetLayout('letter-3x10-2.625x1in')!;
    const long = 'Pneumatic rivet puller with the long stroke, spare nosepieces, a spare jaw set and a carrying case for the hangar';
    const pdf = await renderLabelSheet(letter, [{ code: 'T-0042', title: long }], { compress: false });
    const text = pdfStreams(pdf).flatMap(shownText);
    expect(text[0]).toBe('T-0042');
    const title = text.slice(1).join(' ');
    expect(title.startsWith('Pneumatic rivet puller')).toBe(true);
    expect(title.endsWith('…')).toBe(true);
    expect(title.length).toBeLessThan(long.length);
  });

  it('compresses its pages unless told not to', async () => {
    const letter = findSheetLayout('letter-3x10-2.625x1in')!;
    const items = [{ code: 'T-0042', title: 'Air drill' }];
    const compressed = await renderLabelSheet(letter, items);
    expect(compressed.toString('latin1')).toContain('/FlateDecode');
    expect(pdfStreams(compressed).flatMap(shownText)).toEqual(['T-0042', 'Air drill']);
  });
});

describe('fitLines', () => {
  const chars = (s: string) => s.length;

  it('wraps at spaces within the width', () => {
    expect(fitLines('Hand rivet puller, long handle', 18, 3, chars)).toEqual(['Hand rivet puller,', 'long handle']);
  });

  it('ends the last line with an ellipsis when the text runs over', () => {
    expect(fitLines('one two three four five six', 9, 2, chars)).toEqual(['one two', 'three…']);
  });

  it('breaks a word longer than the line', () => {
    expect(fitLines('Supercalifragilistic', 8, 3, chars)).toEqual(['Supercal', 'ifragili', 'stic']);
  });
});

describe('toWinAnsi', () => {
  it('spells fractions out and replaces characters the built-in fonts cannot show', () => {
    expect(toWinAnsi('Drill 2⅝ in, ½ in')).toBe('Drill 2 5/8 in, 1/2 in');
    expect(toWinAnsi('Bucking bar – 1 lb “tungsten”')).toBe('Bucking bar – 1 lb “tungsten”');
    expect(toWinAnsi('Rivet gun 🔧 Δ')).toBe('Rivet gun ? ?');
    expect(toWinAnsi('Blind, structural, dome · 1/8 in · grip −2')).toBe('Blind, structural, dome · 1/8 in · grip -2');
  });
});
