import { useMemo, useState } from 'react';
import { CATEGORY_LABELS, STATUS_LABELS, TOOL_CATEGORIES, TOOL_STATUSES, type ToolCategory, type ToolStatus } from '@shared/tools/categories';
import { SelectField, TextField } from '@/components/ui/field';
import { filterTools, NO_FILTER, type PickableTool, type ToolFilter } from '../utils/tool-selection';
import { PickList } from './pick-list';

const CATEGORY_FILTER = [{ value: '', label: 'All categories' }, ...TOOL_CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] }))];
const STATUS_FILTER = [{ value: '', label: 'Any status' }, ...TOOL_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))];

interface ToolPickerProps {
  tools: readonly PickableTool[];
  selected: ReadonlySet<string>;
  onChange: (selected: Set<string>) => void;
}

/** A searchable checkbox list of tools, with quick filters and select-all for what is shown. */
export function ToolPicker({ tools, selected, onChange }: ToolPickerProps) {
  const [filter, setFilter] = useState<ToolFilter>(NO_FILTER);
  const shown = useMemo(() => filterTools(tools, filter), [tools, filter]);
  return (
    <PickList
      items={tools}
      shown={shown}
      selected={selected}
      onChange={onChange}
      noun={{ one: 'tool', many: 'tools' }}
      filters={
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField label="Search code, name or place" type="search" value={filter.search} onChange={(e) => setFilter({ ...filter, search: e.target.value })} />
          <SelectField
            label="Category"
            options={CATEGORY_FILTER}
            value={filter.category}
            onChange={(e) => setFilter({ ...filter, category: e.target.value as ToolCategory | '' })}
          />
          <SelectField
            label="Status"
            options={STATUS_FILTER}
            value={filter.status}
            onChange={(e) => setFilter({ ...filter, status: e.target.value as ToolStatus | '' })}
          />
        </div>
      }
      describe={(tool) => (
        <>
          <span className="block break-words">{tool.name}</span>
          <span className="block text-sm text-steel">
            {CATEGORY_LABELS[tool.category]} · {STATUS_LABELS[tool.status]}
          </span>
        </>
      )}
    />
  );
}
