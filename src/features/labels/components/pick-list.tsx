import type { ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { selectAll, toggleCode, unselectAll } from '../utils/tool-selection';

interface PickListProps<T extends { code: string }> {
  /** Everything there is to pick, and what the filters let through. */
  items: readonly T[];
  shown: readonly T[];
  selected: ReadonlySet<string>;
  onChange: (selected: Set<string>) => void;
  noun: { one: string; many: string };
  /** The search box and filter fields above the list. */
  filters: ReactNode;
  /** The words beside an item's code. */
  describe: (item: T) => ReactNode;
}

/** A searchable checkbox list with select-all and clear for what is shown. */
export function PickList<T extends { code: string }>({ items, shown, selected, onChange, noun, filters, describe }: PickListProps<T>) {
  const shownSelected = shown.filter((t) => selected.has(t.code)).length;
  const hiddenSelected = selected.size - shownSelected;
  return (
    <div className="flex flex-col gap-3">
      {filters}
      <div className="flex flex-wrap items-center gap-2">
        <Button variant="secondary" onClick={() => onChange(selectAll(selected, shown))} disabled={shown.length === 0 || shownSelected === shown.length}>
          Select all {shown.length} shown
        </Button>
        <Button variant="quiet" onClick={() => onChange(unselectAll(selected, shown))} disabled={shownSelected === 0}>
          Clear shown
        </Button>
      </div>
      <p className="text-sm text-steel" aria-live="polite">
        Showing {shown.length} of {items.length} {noun.many} · {selected.size} selected
        {hiddenSelected > 0 && ` (${hiddenSelected} hidden by the filters)`}
      </p>
      {shown.length === 0 ? (
        <p className="rounded-lg border border-rule px-3 py-6 text-center text-steel">
          {items.length === 0 ? `No ${noun.many} yet.` : `No ${noun.one} matches these filters.`}
        </p>
      ) : (
        <ul aria-label={noun.many.charAt(0).toUpperCase() + noun.many.slice(1)} className="max-h-[60vh] divide-y divide-rule overflow-y-auto rounded-lg border border-rule bg-card">
          {shown.map((item) => (
            <li key={item.code}>
              <label className="flex min-h-12 cursor-pointer items-center gap-3 px-3 py-2 hover:bg-paper">
                <input type="checkbox" className="size-5 shrink-0 accent-ink" checked={selected.has(item.code)} onChange={() => onChange(toggleCode(selected, item.code))} />
                <span className="w-20 shrink-0 font-mono font-medium">{item.code}</span>
                <span className="min-w-0 flex-1">{describe(item)}</span>
              </label>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
