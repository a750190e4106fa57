import { sheetPageCount } from '@shared/labels/sheet-pages';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** What the download will hold, in words: how many labels on how many pages, and where they start. */
export function describeSheet(count: number, skip: number, labelsPerPage: number, nothingPicked = 'No tools picked yet.'): string {
  if (count === 0) return nothingPicked;
  const pages = sheetPageCount(count, skip, labelsPerPage);
  const amount = `${plural(count, 'label', 'labels')} on ${plural(pages, 'page', 'pages')}`;
  if (skip === 0 || labelsPerPage === 1) return `${amount}.`;
  return `${amount}, starting at label ${skip + 1} of the first page (the first ${plural(skip, 'label stays', 'labels stay')} blank).`;
}
