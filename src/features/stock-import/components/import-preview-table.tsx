import { useState } from 'react';
import type { ImportPreview } from '@shared/schemas/bin-import';
import { Code } from '@/components/ui/page';

/** A long file shows its first rows; the counts above always cover the whole file. */
const MAX_ROWS_SHOWN = 500;

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

export function describePreview(p: ImportPreview): string {
  return `${plural(p.rows.length, 'row', 'rows')}: ${p.valid} ready, ${p.invalid} with problems.`;
}

/** Each row of a checked file: the code it gets, what it is, and either "Ready" or its problems in words. */
export function ImportPreviewTable({ preview }: { preview: ImportPreview }) {
  const [onlyProblems, setOnlyProblems] = useState(preview.invalid > 0);
  const rows = onlyProblems ? preview.rows.filter((r) => !r.ok) : preview.rows;
  const shown = rows.slice(0, MAX_ROWS_SHOWN);
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="font-medium" aria-live="polite">
          {describePreview(preview)}
        </p>
        {preview.invalid > 0 && preview.valid > 0 && (
          <label className="inline-flex min-h-12 items-center gap-2">
            <input type="checkbox" className="size-5" checked={onlyProblems} onChange={(e) => setOnlyProblems(e.target.checked)} />
            Show only rows with problems
          </label>
        )}
      </div>
      <div className="rounded-xl border border-rule bg-card sm:overflow-x-auto">
        <table className="w-full border-collapse text-left max-sm:block">
          <caption className="sr-only">Rows of the file</caption>
          <thead className="bg-paper max-sm:hidden">
            <tr>
              {['Line', 'Code', 'Bin', 'Check'].map((h) => (
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
                <td className="px-3 py-2 max-sm:inline max-sm:p-0">
                  <Code>{row.code}</Code>
                </td>
                <td className="px-3 py-2 max-sm:block max-sm:p-0">{row.designation || <span className="text-steel">(shown once the row is ready)</span>}</td>
                <td className="px-3 py-2 max-sm:block max-sm:p-0 max-sm:pt-1">
                  {row.ok ? (
                    <span className="font-semibold text-ok">Ready</span>
                  ) : (
                    <ul className="flex list-none flex-col gap-1 text-sm">
                      {row.errors.map((e) => (
                        <li key={e.message} className="text-bad">
                          <span className="font-semibold">Problem: </span>
                          {e.message}
                        </li>
                      ))}
                    </ul>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {rows.length > shown.length && <p className="text-sm text-steel">Showing the first {MAX_ROWS_SHOWN} of {rows.length} rows.</p>}
    </div>
  );
}
