import { useMemo, useState } from 'react';
import { BIN_KIND_LABELS, BIN_KINDS, type BinKind } from '@shared/stock/kinds';
import { SelectField, TextField } from '@/components/ui/field';
import { filterBins, NO_BIN_FILTER, type BinFilter, type PickableBin } from '../utils/bin-selection';
import { PickList } from './pick-list';

const KIND_FILTER = [{ value: '', label: 'All kinds' }, ...BIN_KINDS.map((k) => ({ value: k, label: BIN_KIND_LABELS[k] }))];

interface BinPickerProps {
  bins: readonly PickableBin[];
  selected: ReadonlySet<string>;
  onChange: (selected: Set<string>) => void;
}

/** A searchable checkbox list of stock bins; each label carries the bin's code and designation. */
export function BinPicker({ bins, selected, onChange }: BinPickerProps) {
  const [filter, setFilter] = useState<BinFilter>(NO_BIN_FILTER);
  const shown = useMemo(() => filterBins(bins, filter), [bins, filter]);
  return (
    <PickList
      items={bins}
      shown={shown}
      selected={selected}
      onChange={onChange}
      noun={{ one: 'bin', many: 'bins' }}
      filters={
        <div className="grid gap-3 sm:grid-cols-3">
          <div className="sm:col-span-2">
            <TextField label="Search code, designation or place" type="search" value={filter.search} onChange={(e) => setFilter({ ...filter, search: e.target.value })} />
          </div>
          <SelectField label="Kind" options={KIND_FILTER} value={filter.kind} onChange={(e) => setFilter({ ...filter, kind: e.target.value as BinKind | '' })} />
        </div>
      }
      describe={(bin) => (
        <>
          <span className="block break-words">{bin.designation}</span>
          <span className="block text-sm text-steel">
            {BIN_KIND_LABELS[bin.kind]}
            {bin.location && ` · ${bin.location}`}
          </span>
        </>
      )}
    />
  );
}
