import type { ImportPreview, ImportRow, ImportRowStatus } from '@shared/schemas/bin-import';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

export const STATUS_WORDS: Record<ImportRowStatus, string> = { new: 'New bin', update: 'Update', unchanged: 'Unchanged', problem: 'Problem' };

/** "5 rows: 2 new, 1 update, 1 unchanged, 1 with problems. 1 to check." */
export function describePreview(p: ImportPreview): string {
  const { counts } = p;
  const parts = [
    counts.new > 0 && `${counts.new} new`,
    counts.update > 0 && plural(counts.update, 'update', 'updates'),
    counts.unchanged > 0 && `${counts.unchanged} unchanged`,
    counts.problem > 0 && `${counts.problem} with problems`,
  ].filter(Boolean);
  const warned = p.rows.filter((r) => r.warnings.length > 0).length;
  return `${plural(p.rows.length, 'row', 'rows')}: ${parts.join(', ')}.${warned > 0 ? ` ${warned} to check.` : ''}`;
}

/** What the Import button does: "Import 2 new bins and 1 update". */
export function importLabel(p: ImportPreview): string {
  const parts = [p.counts.new > 0 && plural(p.counts.new, 'new bin', 'new bins'), p.counts.update > 0 && plural(p.counts.update, 'update', 'updates')].filter(Boolean);
  return parts.length > 0 ? `Import ${parts.join(' and ')}` : 'Import bins';
}

export const ROW_FILTERS = [
  { value: 'attention', label: 'New, updated and to check' },
  { value: 'problem', label: 'Rows with problems' },
  { value: 'all', label: 'Every row' },
] as const;
export type RowFilter = (typeof ROW_FILTERS)[number]['value'];

/** Problems first when there are any; otherwise what the import will do, leaving out rows that change nothing. */
export const defaultFilter = (p: ImportPreview): RowFilter => (p.counts.problem > 0 ? 'problem' : p.counts.unchanged > 0 ? 'attention' : 'all');

export function rowsShown(p: ImportPreview, filter: RowFilter): ImportRow[] {
  if (filter === 'problem') return p.rows.filter((r) => r.status === 'problem');
  if (filter === 'attention') return p.rows.filter((r) => r.status !== 'unchanged' || r.warnings.length > 0);
  return p.rows;
}
