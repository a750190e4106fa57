import { useState } from 'react';
import type { ImportPreview, ImportRow, ImportRowStatus } from '@shared/schemas/bin-import';
import { Badge } from '@/components/ui/badge';
import { SelectField } from '@/components/ui/field';
import { Code } from '@/components/ui/page';
import { defaultFilter, describePreview, ROW_FILTERS, rowsShown, STATUS_WORDS, type RowFilter } from '../utils/preview-words';

/** A long file shows its first rows; the counts above always cover the whole file. */
const MAX_ROWS_SHOWN = 500;

const STATUS_LOOK: Record<ImportRowStatus, { mark: string; className: string }> = {
  new: { mark: '+', className: 'bg-ok-soft text-ok' },
  update: { mark: '✎', className: 'bg-warn-soft text-warn' },
  unchanged: { mark: '=', className: 'border border-rule text-ink-soft' },
  problem: { mark: '✕', className: 'bg-bad-soft text-bad' },
};

function Changes({ row }: { row: ImportRow }) {
  return (
    <ul className="flex list-none flex-col gap-1 text-sm" aria-label={`Changes to ${row.code}`}>
      {row.changes.map((c) => (
        <li key={c.column} className="break-words">
          <span className="font-mono">{c.column}</span>: <span className="text-ink-soft line-through">{c.from || '(empty)'}</span>
          <span aria-hidden> → </span>
          <span className="sr-only"> becomes </span>
          <span className="font-semibold">{c.to || '(empty)'}</span>
        </li>
      ))}
    </ul>
  );
}

function Outcome({ row }: { row: ImportRow }) {
  const look = STATUS_LOOK[row.status];
  return (
    <div className="flex flex-col gap-1.5">
      <Badge mark={look.mark} className={`self-start ${look.className}`}>
        {STATUS_WORDS[row.status]}
      </Badge>
      {row.changes.length > 0 && <Changes row={row} />}
      {(row.errors.length > 0 || row.warnings.length > 0) && (
        <ul className="flex list-none flex-col gap-1 text-sm">
          {row.errors.map((e) => (
            <li key={e.message} className="text-bad">
              <span className="font-semibold">Problem: </span>
              {e.message}
            </li>
          ))}
          {row.warnings.map((w) => (
            <li key={w.message} className="text-warn">
              <span className="font-semibold">Check: </span>
              {w.message}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

/** Each row of a checked file: the code it gets or names, what it is, and what importing it does. */
export function ImportPreviewTable({ preview }: { preview: ImportPreview }) {
  const [filter, setFilter] = useState<RowFilter>(() => defaultFilter(preview));
  const rows = rowsShown(preview, filter);
  const shown = rows.slice(0, MAX_ROWS_SHOWN);
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <p className="font-medium" aria-live="polite">
          {describePreview(preview)}
        </p>
        <SelectField label="Show" value={filter} onChange={(e) => setFilter(e.target.value as RowFilter)} options={ROW_FILTERS} className="sm:w-72" />
      </div>
      {shown.length === 0 ? (
        <p className="text-ink-soft">No rows of this kind. Choose “Every row” to see the whole file.</p>
      ) : (
        <div className="rounded-xl border border-rule bg-card sm:overflow-x-auto">
          <table className="w-full border-collapse text-left max-sm:block">
            <caption className="sr-only">Rows of the file</caption>
            <thead className="bg-paper max-sm:hidden">
              <tr>
                {['Line', 'Code', 'Bin', 'Import does'].map((h) => (
                  <th key={h} scope="col" className="border-b border-rule px-3 py-2 text-sm font-semibold">
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody className="max-sm:block">
              {shown.map((row) => (
                <tr key={row.line} className="border-b border-rule align-top last:border-b-0 max-sm:block max-sm:px-3 max-sm:py-2">
                  <td className="px-3 py-2 font-mono max-sm:inline max-sm:p-0 max-sm:after:content-['_·_']">
                    <span className="sm:hidden">Line </span>
                    {row.line}
                  </td>
                  <td className="px-3 py-2 whitespace-nowrap max-sm:inline max-sm:p-0">
                    <Code>{row.code}</Code>
                  </td>
                  <td className="px-3 py-2 break-words max-sm:block max-sm:p-0">{row.designation || <span className="text-ink-soft">(shown once the row is ready)</span>}</td>
                  <td className="px-3 py-2 max-sm:block max-sm:p-0 max-sm:pt-1">
                    <Outcome row={row} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {rows.length > shown.length && <p className="text-sm text-ink-soft">Showing the first {MAX_ROWS_SHOWN} of {rows.length} rows.</p>}
    </div>
  );
}
