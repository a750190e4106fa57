import { CATEGORY_LABELS, STATUS_LABELS, TOOL_CATEGORIES, TOOL_STATUSES, type ToolCategory, type ToolStatus } from '@shared/tools/categories';
import { filterOptions } from '@/components/ui/filter-options';
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
  { id: 'category', label: 'Category', options: filterOptions('All categories', TOOL_CATEGORIES, (c) => CATEGORY_LABELS[c]), of: (t) => t.category },
  { id: 'status', label: 'Status', options: filterOptions('Any status', TOOL_STATUSES, (s) => STATUS_LABELS[s]), of: (t) => t.status },
];

/** Tools matching the search (code, name or location, any case) and the category and status filters. */
export function filterTools<T extends PickableTool>(tools: readonly T[], filter: ToolFilter): T[] {
  return filterItems(tools, toolSearchText, TOOL_FACETS, filter);
}
