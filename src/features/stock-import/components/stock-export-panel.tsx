import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { BINS_CSV_URL, defaultLedgerRange, ledgerCsvUrl, ledgerRangeProblems } from '../utils/csv-links';

const LINK_BUTTON = 'inline-flex min-h-12 items-center justify-center rounded-lg border-2 border-ink bg-card px-5 font-semibold text-ink hover:bg-paper';

/** Downloads: every bin (it imports again as it is), and the ledger for a range of days. */
export function StockExportPanel({ now }: { now?: Date }) {
  const [range, setRange] = useState(() => defaultLedgerRange(now));
  const problems = ledgerRangeProblems(range.from, range.to);
  const problem = problems.from ?? problems.to;
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-col gap-2">
        <p>Every bin with its spec, costs, supplier and what is on hand. The file imports into another crib as it is.</p>
        <a href={BINS_CSV_URL} download className={`${LINK_BUTTON} self-start`}>
          Export bins (CSV)
        </a>
      </div>
      <div className="flex flex-col gap-3">
        <p>Every ledger entry from the first day to the last, both included, oldest first. Days run midnight to midnight UTC.</p>
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField label="From" type="date" value={range.from} onChange={(e) => setRange((r) => ({ ...r, from: e.target.value }))} error={problems.from} />
          <TextField label="To" type="date" value={range.to} onChange={(e) => setRange((r) => ({ ...r, to: e.target.value }))} error={problems.to} />
        </div>
        {problem ? (
          <Button variant="secondary" disabled className="self-start">
            Export ledger (CSV)
          </Button>
        ) : (
          <a href={ledgerCsvUrl(range.from, range.to)} download className={`${LINK_BUTTON} self-start`}>
            Export ledger (CSV)
          </a>
        )}
      </div>
    </div>
  );
}
