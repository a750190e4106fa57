import { z } from 'zod';

/** A CSV file of bins is at most about 2 MB and 5,000 rows. */
export const MAX_IMPORT_CSV_CHARS = 2_000_000;
export const MAX_IMPORT_ROWS = 5_000;

export const binImportBodySchema = z
  .object({
    csv: z
      .string({ error: 'Send the CSV text of the file.' })
      .max(MAX_IMPORT_CSV_CHARS, { error: 'The file is larger than 2 MB. Split it into smaller files.' }),
  })
  .strict();
export type BinImportBody = z.infer<typeof binImportBodySchema>;

/** A problem with one cell, or with the whole file when `column` is empty. `message` is a whole sentence naming the line and column. */
export const importProblemSchema = z.object({ column: z.string(), message: z.string() });
export type ImportProblem = z.infer<typeof importProblemSchema>;

/** What importing a row does: make a new bin, update the bin with its code, nothing, or nothing until its problems are fixed. */
export const IMPORT_ROW_STATUSES = ['new', 'update', 'unchanged', 'problem'] as const;
export type ImportRowStatus = (typeof IMPORT_ROW_STATUSES)[number];

/** One field an update changes, in the file's column name and as the CSV writes the values. */
export const importChangeSchema = z.object({ column: z.string(), from: z.string(), to: z.string() });
export type ImportChange = z.infer<typeof importChangeSchema>;

export const importRowSchema = z.object({
  /** The line in the file as a text editor or spreadsheet numbers it (the header is line 1). */
  line: z.number(),
  /** The bin's code: as written, or the next free one when the cell was empty. */
  code: z.string(),
  designation: z.string(),
  status: z.enum(IMPORT_ROW_STATUSES),
  /** For an update: each field that changes, old → new. */
  changes: z.array(importChangeSchema),
  /** Worth a look, but no reason to refuse: a second bin of the same thing, an on-hand figure that is ignored. */
  warnings: z.array(importProblemSchema),
  errors: z.array(importProblemSchema),
});
export type ImportRow = z.infer<typeof importRowSchema>;

export const importPreviewSchema = z.object({
  rows: z.array(importRowSchema),
  /** How many rows of each status. */
  counts: z.object({ new: z.number(), update: z.number(), unchanged: z.number(), problem: z.number() }),
  /** The columns found in the header, as read (after trimming and lower-casing). */
  columns: z.array(z.string()),
  /** Problems with the file as a whole: empty, unknown or missing columns. */
  fileErrors: z.array(importProblemSchema),
  /** True when nothing is wrong with the file or any row, and at least one row makes or changes a bin. */
  canImport: z.boolean(),
});
export type ImportPreview = z.infer<typeof importPreviewSchema>;

/** The codes of the bins made and of the bins updated, and how many rows changed nothing. */
export const importResultSchema = z.object({ created: z.array(z.string()), updated: z.array(z.string()), unchanged: z.number() });
export type ImportResult = z.infer<typeof importResultSchema>;

const isoDay = (what: string) => z.iso.date({ error: `Give the ${what} date like 2026-11-30.` });

/** A ledger export covers whole days, UTC, both ends included. */
export const ledgerExportQuerySchema = z
  .object({ from: isoDay('start'), to: isoDay('end') })
  .refine((q) => q.from <= q.to, { path: ['to'], error: 'The end date is before the start date: swap them.' });
export type LedgerExportQuery = z.infer<typeof ledgerExportQuerySchema>;
