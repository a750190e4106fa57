import type { ToolCategory, ToolStatus } from '@shared/tools/categories';

export interface PickableTool {
  code: string;
  name: string;
  category: ToolCategory;
  status: ToolStatus;
  location: string;
}

export interface ToolFilter {
  search: string;
  category: ToolCategory | '';
  status: ToolStatus | '';
}

export const NO_FILTER: ToolFilter = { search: '', category: '', status: '' };

/** A tool or a bin: anything with a code on a label. */
interface Coded {
  code: string;
}

/** A matcher for a search box: every word must appear in one of the texts, in any case. */
export function searchMatcher(search: string): (...texts: string[]) => boolean {
  const words = search.trim().toLowerCase().split(/\s+/).filter(Boolean);
  return (...texts) => {
    const haystack = texts.join(' ').toLowerCase();
    return words.every((w) => haystack.includes(w));
  };
}

/** Tools matching the search (code, name or location, any case) and the category and status filters. */
export function filterTools<T extends PickableTool>(tools: readonly T[], filter: ToolFilter): T[] {
  const matches = searchMatcher(filter.search);
  return tools.filter(
    (t) => (!filter.category || t.category === filter.category) && (!filter.status || t.status === filter.status) && matches(t.code, t.name, t.location),
  );
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

/** The picked codes in the order of the list, so the sheet reads like the list. */
export function codesInListOrder(items: readonly Coded[], selected: ReadonlySet<string>): string[] {
  return items.filter((t) => selected.has(t.code)).map((t) => t.code);
}
