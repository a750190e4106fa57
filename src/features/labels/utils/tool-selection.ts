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

/** Tools matching the search (code, name or location, any case) and the category and status filters. */
export function filterTools<T extends PickableTool>(tools: readonly T[], filter: ToolFilter): T[] {
  const words = filter.search.trim().toLowerCase().split(/\s+/).filter(Boolean);
  return tools.filter(
    (t) =>
      (!filter.category || t.category === filter.category) &&
      (!filter.status || t.status === filter.status) &&
      words.every((w) => `${t.code} ${t.name} ${t.location}`.toLowerCase().includes(w)),
  );
}

export function toggleCode(selected: ReadonlySet<string>, code: string): Set<string> {
  const next = new Set(selected);
  if (!next.delete(code)) next.add(code);
  return next;
}

/** Adds every shown tool to the selection; the tools picked before stay picked. */
export function selectAll(selected: ReadonlySet<string>, shown: readonly PickableTool[]): Set<string> {
  return new Set([...selected, ...shown.map((t) => t.code)]);
}

/** Takes the shown tools out of the selection; picked tools hidden by the filters stay picked. */
export function unselectAll(selected: ReadonlySet<string>, shown: readonly PickableTool[]): Set<string> {
  const hidden = new Set(shown.map((t) => t.code));
  return new Set([...selected].filter((code) => !hidden.has(code)));
}

/** The picked codes in the order of the tool list, so the sheet reads like the list. */
export function codesInListOrder(tools: readonly PickableTool[], selected: ReadonlySet<string>): string[] {
  return tools.filter((t) => selected.has(t.code)).map((t) => t.code);
}
