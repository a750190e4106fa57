import { useMemo, useState, type ReactNode } from 'react';
import { Button } from './button';
import { SelectField, TextField } from './field';
import { filterItems, selectAll, toggleCode, unselectAll, type Coded, type ItemFilter, type PickerFacet } from './item-picking';

/** The search box takes the columns the facets leave on a row of three. */
const SEARCH_SPAN = ['sm:col-span-3', 'sm:col-span-2', ''];

export interface ItemPickerProps<T extends Coded, K extends string> {
  /** Everything there is to pick, in list order. */
  items: readonly T[];
  selected: ReadonlySet<string>;
  onChange: (selected: Set<string>) => void;
  noun: { one: string; many: string };
  searchLabel: string;
  /** The texts the search box looks in, the code among them. */
  searchIn: (item: T) => string[];
  facets: readonly PickerFacet<T, K>[];
  /** The words beside an item's code. */
  describe: (item: T) => ReactNode;
}

function noFilter<K extends string>(facets: readonly { id: K }[]): ItemFilter<K> {
  return Object.fromEntries([['search', ''], ...facets.map((f) => [f.id, ''])]) as ItemFilter<K>;
}

/** A searchable checkbox list of coded items (tools, bins), with select-all and clear for what is shown. */
export function ItemPicker<T extends Coded, K extends string>({ items, selected, onChange, noun, searchLabel, searchIn, facets, describe }: ItemPickerProps<T, K>) {
  const [filter, setFilter] = useState<ItemFilter<K>>(() => noFilter(facets));
  const shown = useMemo(() => filterItems(items, searchIn, facets, filter), [items, searchIn, facets, filter]);
  const shownSelected = shown.filter((t) => selected.has(t.code)).length;
  const hiddenSelected = selected.size - shownSelected;
  return (
    <div className="flex flex-col gap-3">
      <div className="grid gap-3 sm:grid-cols-3">
        <div className={SEARCH_SPAN[facets.length] ?? ''}>
          <TextField label={searchLabel} type="search" value={filter.search} onChange={(e) => setFilter({ ...filter, search: e.target.value })} />
        </div>
        {facets.map((f) => (
          <SelectField key={f.id} label={f.label} options={f.options} value={filter[f.id]} onChange={(e) => setFilter({ ...filter, [f.id]: e.target.value })} />
        ))}
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
