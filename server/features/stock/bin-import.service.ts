import type { ImportPreview, ImportResult } from '@shared/schemas/bin-import';
import type { CreateBinInput } from '@shared/schemas/bins';
import type { ServiceContext } from '../../context';
import type { BinRow } from '../../db/schema/stock';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { mapInSlices } from '../../lib/event-loop';
import { ALL_BINS, assignCodes, checkBinFile, type CheckedFile, type CheckedRow } from './bin-import-check';
import { DESCRIPTIVE_COLUMNS } from './bin-csv';
import { listBins, type NewBinRow } from './bins.repo';
import { binFieldsRow, newBinRow, writeBinFields, writeNewBins } from './bins.service';

/** At most this many problems travel in a refused import's envelope; the message gives the full count. */
const MAX_ISSUES = 100;

function toPreview(file: CheckedFile): ImportPreview {
  const counts = { new: 0, update: 0, unchanged: 0, problem: 0 };
  for (const row of file.rows) counts[row.status]++;
  const rows = file.rows.map(({ line, code, status, designation, changes, warnings, errors }) => ({ line, code, status, designation, changes, warnings, errors }));
  const canImport = file.fileErrors.length === 0 && counts.problem === 0 && counts.new + counts.update > 0;
  return { rows, counts, columns: file.columns, fileErrors: file.fileErrors, canImport };
}

/** What an import would do, row by row; writes nothing. */
export async function previewImport(ctx: ServiceContext, csv: string): Promise<ImportPreview> {
  return toPreview(await checkBinFile(ctx, csv));
}

function refusal(p: ImportPreview): HttpError {
  if (p.fileErrors.length === 0 && p.counts.problem === 0) {
    return new HttpError(409, 'NOTHING_TO_IMPORT', 'Nothing was imported: every row of the file already matches its bin.');
  }
  const issues = [
    ...p.fileErrors.map((e) => ({ path: e.column ? `file.${e.column}` : 'file', message: e.message })),
    ...p.rows.flatMap((r) => r.errors.map((e) => ({ path: e.column ? `line ${r.line}.${e.column}` : `line ${r.line}`, message: e.message }))),
  ];
  const what = p.fileErrors.length > 0 ? 'the file has problems' : `${p.counts.problem} of ${p.rows.length} rows have problems`;
  return new HttpError(400, 'IMPORT_INVALID', `Nothing was imported: ${what}. Fix them and check the file again.`, issues.slice(0, MAX_ISSUES));
}

const changedMeanwhile = (row: CheckedRow) =>
  new HttpError(409, 'IMPORT_STALE', `Nothing was imported: bin ${row.code} (line ${row.line}) was added or changed while the file was being read. Check the file again.`);

const descriptive = (input: CreateBinInput) => Object.fromEntries(DESCRIPTIVE_COLUMNS.map((c) => [c.field, input[c.field]]));

/** Columns an import never writes: the key, the stock and the times. */
const NOT_DESCRIPTIVE = new Set(['id', 'onHand', 'createdAt', 'updatedAt']);
const sameDescription = (a: BinRow, b: BinRow) => (Object.keys(a) as (keyof BinRow)[]).every((k) => NOT_DESCRIPTIVE.has(k) || a[k] === b[k]);

/** A checked row with what it will write, worked out before the transaction so that stays short. */
interface PlannedRow extends CheckedRow {
  newRow?: NewBinRow;
  set?: Partial<NewBinRow>;
}

/**
 * Writes the planned file in one transaction: every new bin and every update, or nothing. The slow
 * part (reading, checking and mapping each row) ran before, a slice at a time; here the file's bins
 * are read again and must be as they were then, so the transaction is short and nothing is lost.
 */
function writeImport(ctx: ServiceContext, actor: UserRow, planned: readonly PlannedRow[]): ImportResult {
  const now = new Map(listBins(ctx.db, ALL_BINS).rows.map((b) => [b.code, b]));
  const hasWrittenCode = (r: CheckedRow) => r.status !== 'new' || r.input?.code !== undefined;
  for (const row of planned) {
    const current = now.get(row.code);
    const stale = row.before ? !current || !sameDescription(current, row.before) : hasWrittenCode(row) && current !== undefined;
    if (stale) throw changedMeanwhile(row);
  }
  // The free codes were picked against the bins as they were; pick them again against the bins as they are.
  const rows = assignCodes(ctx.db, planned.map((r) => (hasWrittenCode(r) ? r : { ...r, code: '' })), (code) => now.has(code));
  const created = rows.filter((r) => r.status === 'new');
  writeNewBins(
    ctx,
    actor,
    created.map((r) => ({ ...(r as PlannedRow).newRow!, code: r.code })),
  );
  const updated = planned.filter((r) => r.status === 'update');
  writeBinFields(
    ctx,
    updated.map((r) => ({ id: r.before!.id, set: r.set! })),
  );
  return { created: created.map((r) => r.code), updated: updated.map((r) => r.code), unchanged: rows.filter((r) => r.status === 'unchanged').length };
}

/** Creates and updates every bin of the file, or none: see `writeImport`. */
export async function commitImport(ctx: ServiceContext, actor: UserRow, csv: string): Promise<ImportResult> {
  const file = await checkBinFile(ctx, csv);
  const preview = toPreview(file);
  if (!preview.canImport) throw refusal(preview);
  const at = ctx.now();
  const planned = await mapInSlices(file.rows, (row): PlannedRow => {
    if (row.status === 'new') return { ...row, newRow: newBinRow(row.input!, at) };
    if (row.status === 'update') return { ...row, set: binFieldsRow(descriptive(row.input!), at) };
    return row;
  });
  return ctx.db.$client.transaction(() => writeImport(ctx, actor, planned)).immediate();
}
