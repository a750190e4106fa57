import { labelsPerPage, POINTS_PER_UNIT, type SheetLayout } from './layouts';

/** A rectangle in PDF points (1/72 in), measured from the page's top-left corner. */
export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

export function pageSizeInPoints(layout: SheetLayout): { width: number; height: number } {
  const k = POINTS_PER_UNIT[layout.unit];
  return { width: layout.page.width * k, height: layout.page.height * k };
}

/** Where each label sits on a page, in points: row by row, left to right, as a sheet is read. */
export function labelBoxesInPoints(layout: SheetLayout): Box[] {
  const k = POINTS_PER_UNIT[layout.unit];
  const boxes: Box[] = [];
  for (let row = 0; row < layout.rows; row++) {
    for (let column = 0; column < layout.columns; column++) {
      boxes.push({
        x: (layout.margin.left + column * (layout.label.width + layout.gap.horizontal)) * k,
        y: (layout.margin.top + row * (layout.label.height + layout.gap.vertical)) * k,
        width: layout.label.width * k,
        height: layout.label.height * k,
      });
    }
  }
  return boxes;
}

/** The space a layout's labels take, margins included, in the layout's unit: never more than the page. */
export function usedExtent(layout: SheetLayout): { width: number; height: number } {
  return {
    width: layout.margin.left + layout.columns * layout.label.width + (layout.columns - 1) * layout.gap.horizontal,
    height: layout.margin.top + layout.rows * layout.label.height + (layout.rows - 1) * layout.gap.vertical,
  };
}

export interface Placement {
  /** Zero-based page number. */
  page: number;
  box: Box;
}

/**
 * Where `count` labels go when the first `skip` positions of the first page are already used
 * (a partly used sheet fed again): the first label takes position `skip`, then on to the next pages.
 */
export function placeLabels(layout: SheetLayout, count: number, skip: number): Placement[] {
  const boxes = labelBoxesInPoints(layout);
  const perPage = labelsPerPage(layout);
  return Array.from({ length: count }, (_, i) => {
    const position = skip + i;
    return { page: Math.floor(position / perPage), box: boxes[position % perPage]! };
  });
}
