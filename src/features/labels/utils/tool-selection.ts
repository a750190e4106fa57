import { CATEGORY_LABELS, STATUS_LABELS, TOOL_CATEGORIES, TOOL_STATUSES, type ToolCategory, type ToolStatus } from '@shared/tools/categories';
import { filterItems, type PickerFacet } from '@/components/ui/item-picking';

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

/** The search looks in a tool's code, name and place. */
export const toolSearchText = (t: PickableTool) => [t.code, t.name, t.location];

export const TOOL_FACETS: readonly PickerFacet<PickableTool, 'category' | 'status'>[] = [
  { id: 'category', label: 'Category', options: [{ value: '', label: 'All categories' }, ...TOOL_CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] }))], of: (t) => t.category },
  { id: 'status', label: 'Status', options: [{ value: '', label: 'Any status' }, ...TOOL_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))], of: (t) => t.status },
];

/** Tools matching the search (code, name or location, any case) and the category and status filters. */
export function filterTools<T extends PickableTool>(tools: readonly T[], filter: ToolFilter): T[] {
  return filterItems(tools, toolSearchText, TOOL_FACETS, filter);
}
