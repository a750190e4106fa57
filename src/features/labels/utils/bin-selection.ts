import type { BinKind } from '@shared/stock/kinds';
import { searchMatcher } from './tool-selection';

/** What the picker shows of a bin; a Bin from GET /api/bins has all of it. */
export interface PickableBin {
  code: string;
  designation: string;
  kind: BinKind;
  location: string;
  onHand: number;
  unit: string;
}

export interface BinFilter {
  search: string;
  kind: BinKind | '';
}

export const NO_BIN_FILTER: BinFilter = { search: '', kind: '' };

/** Bins matching the search (code, designation or location, any case) and the kind filter. */
export function filterBins<T extends PickableBin>(bins: readonly T[], filter: BinFilter): T[] {
  const matches = searchMatcher(filter.search);
  return bins.filter((b) => (!filter.kind || b.kind === filter.kind) && matches(b.code, b.designation, b.location));
}
