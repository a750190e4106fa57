import type { Response } from 'express';
import Papa from 'papaparse';

export type CsvCell = string | number | null;

/**
 * A spreadsheet runs a cell that starts with = + - @ (or a tab or carriage return) as a formula;
 * text cells get a leading apostrophe so they stay text. Numbers are written as numbers.
 */
export const guardText = (value: string) => (/^[=+\-@\t\r]/.test(value) ? `'${value}` : value);

/** A text cell, guarded; empty for nothing. */
export const textCell = (value: string | null | undefined) => (value ? guardText(value) : '');

/** UTF-8 with a byte-order mark, so spreadsheets show the dashes and degree signs in designations. */
export function toCsv(fields: readonly string[], rows: readonly CsvCell[][]): string {
  return '\uFEFF' + Papa.unparse({ fields: [...fields], data: rows.map((r) => r.map((c) => c ?? '')) }, { newline: '\r\n' });
}

/** Money in a CSV: cents as dollars with two places, a number to the spreadsheet. */
export const centsCell = (cents: number) => (cents / 100).toFixed(2);

/** Sends a CSV as a download (no cache keeps it: every /api answer is no-store). */
export function sendCsv(res: Response, filename: string, csv: string): void {
  res.type('text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
  res.send(csv);
}
