import { useMemo, useState } from 'react';
import { CATEGORY_LABELS, STATUS_LABELS, TOOL_CATEGORIES, TOOL_STATUSES, type ToolCategory, type ToolStatus } from '@shared/tools/categories';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { filterTools, NO_FILTER, selectAll, toggleCode, unselectAll, type PickableTool, type ToolFilter } from '../utils/tool-selection';

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
  const shownSelected = shown.filter((t) => selected.has(t.code)).length;
  const hiddenSelected = selected.size - shownSelected;

  return (
    <div className="flex flex-col gap-3">
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
      <div className="flex flex-wrap items-center gap-2">
        <Button variant="secondary" onClick={() => onChange(selectAll(selected, shown))} disabled={shown.length === 0 || shownSelected === shown.length}>
          Select all {shown.length} shown
        </Button>
        <Button variant="quiet" onClick={() => onChange(unselectAll(selected, shown))} disabled={shownSelected === 0}>
          Clear shown
        </Button>
      </div>
      <p className="text-sm text-steel" aria-live="polite">
        Showing {shown.length} of {tools.length} tools · {selected.size} selected
        {hiddenSelected > 0 && ` (${hiddenSelected} hidden by the filters)`}
      </p>
      {shown.length === 0 ? (
        <p className="rounded-lg border border-rule px-3 py-6 text-center text-steel">No tool matches these filters.</p>
      ) : (
        <ul aria-label="Tools" className="max-h-[60vh] divide-y divide-rule overflow-y-auto rounded-lg border border-rule bg-card">
          {shown.map((tool) => (
            <li key={tool.code}>
              <label className="flex min-h-12 cursor-pointer items-center gap-3 px-3 py-2 hover:bg-paper">
                <input type="checkbox" className="size-5 shrink-0 accent-ink" checked={selected.has(tool.code)} onChange={() => onChange(toggleCode(selected, tool.code))} />
                <span className="w-20 shrink-0 font-mono font-medium">{tool.code}</span>
                <span className="min-w-0 flex-1">
                  <span className="block break-words">{tool.name}</span>
                  <span className="block text-sm text-steel">
                    {CATEGORY_LABELS[tool.category]} · {STATUS_LABELS[tool.status]}
                  </span>
                </span>
              </label>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
