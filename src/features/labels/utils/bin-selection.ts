import { BIN_KIND_LABELS, BIN_KINDS, type BinKind } from '@shared/stock/kinds';
import { filterOptions } from '@/components/ui/filter-options';
import { filterItems, type PickerFacet } from '@/components/ui/item-picking';

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

/** The search looks in a bin's code, designation and place. */
export const binSearchText = (b: PickableBin) => [b.code, b.designation, b.location];

export const BIN_FACETS: readonly PickerFacet<PickableBin, 'kind'>[] = [
  { id: 'kind', label: 'Kind', options: filterOptions('All kinds', BIN_KINDS, (k) => BIN_KIND_LABELS[k]), of: (b) => b.kind },
];

/** Bins matching the search (code, designation or location, any case) and the kind filter. */
export function filterBins<T extends PickableBin>(bins: readonly T[], filter: BinFilter): T[] {
  return filterItems(bins, binSearchText, BIN_FACETS, filter);
}
