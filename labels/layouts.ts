/**
 * Label sheet layouts, kept as data and named by their dimensions. Every length of a layout is in
 * its own `unit` (the unit its sheets are sold and measured in); `toPoints` converts for a renderer.
 * Pure data and types: imports nothing, so the server, the client and the tests can all read it.
 */

export type LengthUnit = 'in' | 'mm';

export interface SheetLayout {
  /** Stable id, built from the page and label dimensions, e.g. `letter-3x10-2.625x1in`. */
  id: string;
  /** What a person reads in the layout picker. */
  name: string;
  /** What kind of printer the sheet is for. */
  media: 'sheet' | 'thermal-roll';
  unit: LengthUnit;
  page: { width: number; height: number };
  label: { width: number; height: number };
  columns: number;
  rows: number;
  /** From the page's top edge to the first row, and from its left edge to the first column. */
  margin: { top: number; left: number };
  /** Space between neighbouring columns (horizontal) and between neighbouring rows (vertical). */
  gap: { horizontal: number; vertical: number };
}

export const POINTS_PER_UNIT: Record<LengthUnit, number> = { in: 72, mm: 72 / 25.4 };

/**
 * US Letter (8.5 × 11 in) with 30 labels of 2 5/8 × 1 in in 3 columns and 10 rows: the common
 * address-label geometry, 1/2 in top and bottom margins, 3/16 in side margins and 1/8 in between
 * columns, rows touching.
 */
const LETTER_30: SheetLayout = {
  id: 'letter-3x10-2.625x1in',
  name: 'US Letter, 30 labels 2⅝ × 1 in',
  media: 'sheet',
  unit: 'in',
  page: { width: 8.5, height: 11 },
  label: { width: 2.625, height: 1 },
  columns: 3,
  rows: 10,
  margin: { top: 0.5, left: 0.1875 },
  gap: { horizontal: 0.125, vertical: 0 },
};

/**
 * A4 (210 × 297 mm) with 24 labels of 70 × 37 mm in 3 columns and 8 rows. Three columns fill the
 * width exactly; eight rows take 296 mm, so the spare millimetre is split top and bottom.
 */
const A4_24: SheetLayout = {
  id: 'a4-3x8-70x37mm',
  name: 'A4, 24 labels 70 × 37 mm',
  media: 'sheet',
  unit: 'mm',
  page: { width: 210, height: 297 },
  label: { width: 70, height: 37 },
  columns: 3,
  rows: 8,
  margin: { top: 0.5, left: 0 },
  gap: { horizontal: 0, vertical: 0 },
};

/** One 2 × 1 in label per page, for a small thermal label printer fed from a roll. */
const THERMAL_2X1: SheetLayout = {
  id: 'thermal-1x1-2x1in',
  name: 'Thermal roll, one label 2 × 1 in per page',
  media: 'thermal-roll',
  unit: 'in',
  page: { width: 2, height: 1 },
  label: { width: 2, height: 1 },
  columns: 1,
  rows: 1,
  margin: { top: 0, left: 0 },
  gap: { horizontal: 0, vertical: 0 },
};

export const SHEET_LAYOUTS: readonly SheetLayout[] = [LETTER_30, A4_24, THERMAL_2X1];

export function findSheetLayout(id: string): SheetLayout | undefined {
  return SHEET_LAYOUTS.find((layout) => layout.id === id);
}

export function labelsPerPage(layout: SheetLayout): number {
  return layout.columns * layout.rows;
}

