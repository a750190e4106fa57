import { useDeferredValue, useState } from 'react';
import type { ForecastList as ForecastListDto } from '@shared/schemas/forecast';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Card } from '@/components/ui/page';
import { formatCount } from '../utils/format';
import { ForecastCard } from './forecast-card';

const PAGE = 30;

/** Bins that need ordering first, then by code. */
const byUrgency = (a: ForecastListDto['data'][number], b: ForecastListDto['data'][number]) =>
  Number(b.needsAlert) - Number(a.needsAlert) || a.bin.code.localeCompare(b.bin.code);

/** Every bin's forecast as cards, with a search box and a "needs ordering" filter; shows 30 at a time. */
export function ForecastList({ list }: { list: ForecastListDto }) {
  const [search, setSearch] = useState('');
  const [needsOnly, setNeedsOnly] = useState(false);
  const [shown, setShown] = useState(PAGE);
  const query = useDeferredValue(search.trim().toLowerCase());

  const needing = list.data.filter((f) => f.needsAlert).length;
  const matches = list.data
    .filter((f) => !needsOnly || f.needsAlert)
    .filter((f) => !query || [f.bin.code, f.bin.designation, f.bin.supplier, f.bin.supplierPart].some((t) => t.toLowerCase().includes(query)))
    .sort(byUrgency);

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="sm:flex-1">
          <TextField
            label="Search bins"
            type="search"
            placeholder="Code, designation or supplier"
            value={search}
            onChange={(e) => {
              setSearch(e.target.value);
              setShown(PAGE);
            }}
          />
        </div>
        <label className="flex min-h-12 items-center gap-3 rounded-lg border-2 border-edge bg-card px-3 font-semibold">
          <input
            type="checkbox"
            className="size-5 accent-ink"
            checked={needsOnly}
            onChange={(e) => {
              setNeedsOnly(e.target.checked);
              setShown(PAGE);
            }}
          />
          Needs ordering only
        </label>
      </div>
      <p aria-live="polite">
        Needs ordering: {formatCount(needing)} of {formatCount(list.data.length)} {list.data.length === 1 ? 'bin' : 'bins'}. Showing {formatCount(Math.min(shown, matches.length))} of{' '}
        {formatCount(matches.length)}.
      </p>
      {matches.length === 0 ? (
        <Card>
          <p>{needsOnly && !query ? 'No bin needs ordering now.' : 'No bin matches this search.'}</p>
        </Card>
      ) : (
        matches.slice(0, shown).map((f) => <ForecastCard key={f.bin.code} forecast={f} serviceLevel={list.meta.serviceLevel} />)
      )}
      {matches.length > shown && (
        <Button variant="secondary" className="self-center" onClick={() => setShown((n) => n + PAGE)}>
          Show {formatCount(Math.min(PAGE, matches.length - shown))} more
        </Button>
      )}
    </div>
  );
}
