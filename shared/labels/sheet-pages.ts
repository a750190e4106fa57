/** How many pages `count` labels need when the first `skip` positions of the first page are used. */
export function sheetPageCount(count: number, skip: number, labelsPerPage: number): number {
  if (count <= 0) return 0;
  return Math.ceil((skip + count) / labelsPerPage);
}
