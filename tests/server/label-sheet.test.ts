import { describe, expect, it } from 'vitest';
import { findSheetLayout, SHEET_LAYOUTS } from '../../labels/layouts';
import { pageSizeInPoints } from '../../labels/sheet-geometry';
import { fitLabelText, fitLines, toWinAnsi } from '../../server/features/labels/fit-text';
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

  // The longest general-purpose blind rivet designation the bin form allows (aluminium body and stem, 5/32 in,
  // grip -8: 0.376–0.500 in, TM 10-5410-221-14/1 Table 4-3), whose label says it is not for structure
  // (AC 43.13-1B p. 4-24).
  const longestBlind = 'Blind, general purpose, dome, aluminium, aluminium stem · 5/32 in · grip −8 (0.376–0.500 in)';

  it.each(SHEET_LAYOUTS.map((l) => [l.id, l] as const))('draws a blind rivet grip range whole and the caution on the %s layout', async (_id, layout) => {
    const pdf = await renderLabelSheet(layout, [{ code: 'B-0107', title: longestBlind, caution: 'Not for structure' }], { compress: false });
    const text = pdfStreams(pdf).flatMap(shownText);
    expect(text[0]).toBe('B-0107');
    const drawn = text.slice(1).join(' ');
    expect(drawn).toContain('5/32 in · grip -8 (0.376–0.500 in)');
    expect(text.at(-1)).toBe('Not for structure');
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

describe('fitLabelText', () => {
  const chars = (s: string, size: number) => s.length * size;
  const room = { width: 20, height: 3, fontSize: 1, minFontSize: 0.5, lineHeight: 1 };

  it('keeps the template size when the title and caution fit', () => {
    expect(fitLabelText('Rivet · 1/8 in', 'Not for structure', room, chars)).toEqual({ fontSize: 1, lines: ['Rivet · 1/8 in', 'Not for structure'] });
  });

  it('shrinks the type rather than cut a measurement or the caution', () => {
    const fitted = fitLabelText('Blind, general · 1/8 in · grip −1 (0.020–0.062 in)', 'Not for structure', room, chars);
    expect(fitted.fontSize).toBeLessThan(1);
    expect(fitted.fontSize).toBeGreaterThanOrEqual(0.5);
    expect(fitted.lines.join(' ')).toBe('Blind, general · 1/8 in · grip −1 (0.020–0.062 in) Not for structure');
    expect(fitted.lines.length).toBeLessThanOrEqual(Math.floor(room.height / fitted.fontSize));
    for (const line of fitted.lines) expect(chars(line, fitted.fontSize)).toBeLessThanOrEqual(room.width);
  });

  it('at the smallest size shortens only the name, never the measurements after it or the caution', () => {
    const tight = { ...room, minFontSize: 1 };
    expect(fitLabelText('Blind, general purpose, dome, aluminium · 1/8 in', 'Not for structure', tight, chars)).toEqual({
      fontSize: 1,
      lines: ['Blind, general…', '1/8 in', 'Not for structure'],
    });
  });

  it('shortens a plain name with an ellipsis at the template size, as before', () => {
    expect(fitLabelText('one two three four five six seven eight', undefined, { ...room, width: 9, height: 2 }, chars)).toEqual({
      fontSize: 1,
      lines: ['one two', 'three…'],
    });
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
