import { describe, expect, it } from 'vitest';
import { sheetPageCount } from '@shared/labels/sheet-pages';
import { sheetLayoutListSchema } from '@shared/schemas/labels';
import { arrangeLabel } from '../../labels/label-template';
import { findSheetLayout, labelsPerPage, SHEET_LAYOUTS, type SheetLayout } from '../../labels/layouts';
import { labelBoxesInPoints, pageSizeInPoints, placeLabels, usedExtent, type Box } from '../../labels/sheet-geometry';

const EPSILON = 1e-9;
const inside = (inner: Box, outer: Box) =>
  inner.x >= outer.x - EPSILON &&
  inner.y >= outer.y - EPSILON &&
  inner.x + inner.width <= outer.x + outer.width + EPSILON &&
  inner.y + inner.height <= outer.y + outer.height + EPSILON;
const overlap = (a: Box, b: Box) =>
  a.x < b.x + b.width - EPSILON && b.x < a.x + a.width - EPSILON && a.y < b.y + b.height - EPSILON && b.y < a.y + a.height - EPSILON;

describe.each(SHEET_LAYOUTS.map((layout) => [layout.id, layout] as const))('sheet layout %s', (_id, layout: SheetLayout) => {
  it('fits its page: margins, columns and gaps take no more than the page width and height', () => {
    const used = usedExtent(layout);
    expect(used.width).toBeLessThanOrEqual(layout.page.width + EPSILON);
    expect(used.height).toBeLessThanOrEqual(layout.page.height + EPSILON);
    expect(Math.min(layout.margin.top, layout.margin.left, layout.gap.horizontal, layout.gap.vertical)).toBeGreaterThanOrEqual(0);
  });

  it('puts every label on the page, none overlapping another', () => {
    const page = { x: 0, y: 0, ...pageSizeInPoints(layout) };
    const boxes = labelBoxesInPoints(layout);
    expect(boxes).toHaveLength(layout.columns * layout.rows);
    for (const [i, box] of boxes.entries()) {
      expect(inside(box, page)).toBe(true);
      for (const other of boxes.slice(i + 1)) expect(overlap(box, other)).toBe(false);
    }
  });

  it('keeps the QR square and the text inside the label, even for the longest code', () => {
    for (const box of labelBoxesInPoints(layout)) {
      const t = arrangeLabel(box, 'T-000042'.length);
      expect(inside(t.qr, box)).toBe(true);
      expect(t.qr.width).toBe(t.qr.height);
      // Courier advances 0.6 em per character (Adobe Core 14 font metrics).
      expect(t.code.x + 'T-000042'.length * 0.6 * t.code.fontSize).toBeLessThanOrEqual(box.x + box.width + EPSILON);
      expect(t.code.x).toBeGreaterThanOrEqual(t.qr.x + t.qr.width - EPSILON);
      expect(t.title.y + t.title.maxLines * t.title.fontSize * 1.2).toBeLessThanOrEqual(box.y + box.height + EPSILON);
      expect(t.title.y + t.title.height).toBeLessThanOrEqual(box.y + box.height + EPSILON);
      expect(t.title.minFontSize).toBeLessThanOrEqual(t.title.fontSize);
    }
  });

  it('is named by its dimensions, never by a product number', () => {
    expect(layout.id).toMatch(/^[a-z0-9]+-\d+x\d+-[\d.]+x[\d.]+(in|mm)$/);
    expect(layout.id).toContain(`${layout.columns}x${layout.rows}-${layout.label.width}x${layout.label.height}${layout.unit}`);
    expect(layout.name).not.toMatch(/\d{4,}|[A-Z]\d{3,}/);
  });
});

describe('the sheet layouts', () => {
  it('have unique ids and match the API contract', () => {
    expect(new Set(SHEET_LAYOUTS.map((l) => l.id)).size).toBe(SHEET_LAYOUTS.length);
    expect(sheetLayoutListSchema.safeParse({ data: SHEET_LAYOUTS }).success).toBe(true);
  });

  it('include US Letter with 30 labels of 2 5/8 × 1 in in the common address-label geometry', () => {
    const letter = findSheetLayout('letter-3x10-2.625x1in')!;
    // US Letter, ANSI/ASME Y14.1 size A: 8.5 × 11 in.
    expect(letter.page).toEqual({ width: 8.5, height: 11 });
    expect(letter.unit).toBe('in');
    expect(labelsPerPage(letter)).toBe(30);
    expect(letter.label).toEqual({ width: 2.625, height: 1 });
    // Common practice for 30-up address-label sheets: 1/2 in top margin, 3/16 in sides, 1/8 in between columns.
    expect(letter.margin).toEqual({ top: 0.5, left: 0.1875 });
    expect(letter.gap).toEqual({ horizontal: 0.125, vertical: 0 });
    const used = usedExtent(letter);
    expect(letter.page.width - used.width).toBeCloseTo(letter.margin.left, 9);
    expect(letter.page.height - used.height).toBeCloseTo(letter.margin.top, 9);
  });

  it('include A4 with 24 labels of 70 × 37 mm, centred on the page', () => {
    const a4 = findSheetLayout('a4-3x8-70x37mm')!;
    // A4, ISO 216: 210 × 297 mm.
    expect(a4.page).toEqual({ width: 210, height: 297 });
    expect(labelsPerPage(a4)).toBe(24);
    expect(a4.label).toEqual({ width: 70, height: 37 });
    const used = usedExtent(a4);
    expect(a4.page.width - used.width).toBeCloseTo(a4.margin.left, 9);
    expect(a4.page.height - used.height).toBeCloseTo(a4.margin.top, 9);
  });

  it('include one 2 × 1 in label per page for a thermal printer', () => {
    const thermal = findSheetLayout('thermal-1x1-2x1in')!;
    expect(thermal).toMatchObject({ media: 'thermal-roll', page: { width: 2, height: 1 }, label: { width: 2, height: 1 } });
    expect(labelsPerPage(thermal)).toBe(1);
    expect(pageSizeInPoints(thermal)).toEqual({ width: 144, height: 72 });
  });
});

describe('placeLabels', () => {
  const letter = findSheetLayout('letter-3x10-2.625x1in')!;
  const boxes = labelBoxesInPoints(letter);

  it('starts at the first unused position and goes on to the next page', () => {
    const placed = placeLabels(letter, 4, 28);
    expect(placed.map((p) => p.page)).toEqual([0, 0, 1, 1]);
    expect(placed[0]!.box).toEqual(boxes[28]);
    expect(placed[2]!.box).toEqual(boxes[0]);
  });

  it('fills a row left to right before the next row', () => {
    const [first, second, fourth] = [boxes[0]!, boxes[1]!, boxes[3]!];
    expect(second.y).toBe(first.y);
    // 2 5/8 in label + 1/8 in gap = 2.75 in = 198 pt from one column to the next.
    expect(second.x - first.x).toBeCloseTo(198, 9);
    expect(fourth.x).toBe(first.x);
    expect(fourth.y - first.y).toBeCloseTo(72, 9);
  });
});

describe('sheetPageCount', () => {
  it('counts the pages for N labels after the used ones', () => {
    expect(sheetPageCount(30, 0, 30)).toBe(1);
    expect(sheetPageCount(31, 0, 30)).toBe(2);
    expect(sheetPageCount(25, 5, 30)).toBe(1);
    expect(sheetPageCount(26, 5, 30)).toBe(2);
    expect(sheetPageCount(3, 0, 1)).toBe(3);
    expect(sheetPageCount(0, 5, 30)).toBe(0);
  });
});
