/** Anything with a code on a label: a tool or a bin. */
export interface Coded {
  code: string;
}

/** A select box that narrows a picker's list to the items whose `of` equals the chosen value. */
export interface PickerFacet<T, K extends string = string> {
  id: K;
  label: string;
  /** The first option, value '', means no filter. */
  options: readonly { value: string; label: string }[];
  of: (item: T) => string;
}

/** What the search box holds and each facet's chosen value ('' for none). */
export type ItemFilter<K extends string = string> = { search: string } & Record<K, string>;

/** A matcher for a search box: every word must appear in one of the texts, in any case. */
export function searchMatcher(search: string): (...texts: string[]) => boolean {
  const words = search.trim().toLowerCase().split(/\s+/).filter(Boolean);
  return (...texts) => {
    const haystack = texts.join(' ').toLowerCase();
    return words.every((w) => haystack.includes(w));
  };
}

/** The items matching the search (over `searchIn`'s texts) and every chosen facet, in list order. */
export function filterItems<T, K extends string>(
  items: readonly T[],
  searchIn: (item: T) => string[],
  facets: readonly PickerFacet<T, K>[],
  filter: ItemFilter<K>,
): T[] {
  const matches = searchMatcher(filter.search);
  return items.filter((item) => facets.every((f) => !filter[f.id] || f.of(item) === filter[f.id]) && matches(...searchIn(item)));
}

export function toggleCode(selected: ReadonlySet<string>, code: string): Set<string> {
  const next = new Set(selected);
  if (!next.delete(code)) next.add(code);
  return next;
}

/** Adds every shown item to the selection; the items picked before stay picked. */
export function selectAll(selected: ReadonlySet<string>, shown: readonly Coded[]): Set<string> {
  return new Set([...selected, ...shown.map((t) => t.code)]);
}

/** Takes the shown items out of the selection; picked items hidden by the filters stay picked. */
export function unselectAll(selected: ReadonlySet<string>, shown: readonly Coded[]): Set<string> {
  const hidden = new Set(shown.map((t) => t.code));
  return new Set([...selected].filter((code) => !hidden.has(code)));
}

/** The picked codes in the order of the list, so what is made from them reads like the list. */
export function codesInListOrder(items: readonly Coded[], selected: ReadonlySet<string>): string[] {
  return items.filter((t) => selected.has(t.code)).map((t) => t.code);
}
