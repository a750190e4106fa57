import { ledgerExportQuerySchema } from '@shared/schemas/bin-import';
import { chapterDay } from '@shared/time/chapter-time';
import { chapterTimeZone } from '@/lib/chapter-zone';

/** Plain GET downloads: the browser sends the session cookie and saves the file under the server's name. */
export const TEMPLATE_CSV_URL = '/api/bins/import/template.csv';
export const BINS_CSV_URL = '/api/bins/export.csv';
export const ledgerCsvUrl = (from: string, to: string) => `/api/bins/ledger.csv?${new URLSearchParams({ from, to }).toString()}`;

/** This month so far on the chapter's calendar: the first of the month to today. */
export function defaultLedgerRange(now: Date = new Date()): { from: string; to: string } {
  const to = chapterDay(now, chapterTimeZone());
  return { from: `${to.slice(0, 8)}01`, to };
}

/** The same check the server makes, in the same words, by field; empty when the range is fine. */
export function ledgerRangeProblems(from: string, to: string): { from?: string; to?: string } {
  const result = ledgerExportQuerySchema.safeParse({ from, to });
  if (result.success) return {};
  const problems: { from?: string; to?: string } = {};
  for (const issue of result.error.issues) {
    const field = issue.path[0] === 'from' ? 'from' : 'to';
    problems[field] ??= issue.message;
  }
  return problems;
}
