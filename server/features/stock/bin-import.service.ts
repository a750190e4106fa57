import type { ImportPreview, ImportResult } from '@shared/schemas/bin-import';
import type { BinListQuery, CreateBinInput } from '@shared/schemas/bins';
import { binDesignation } from '@shared/stock/fasteners';
import { BIN_CODE_PATTERN } from '@shared/stock/kinds';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { parseBinCsv, problem } from './bin-csv';
import { listBins, nextBinCode } from './bins.repo';
import { insertNewBin } from './bins.service';

export const ALL_BINS: BinListQuery = { page: 1, pageSize: Number.MAX_SAFE_INTEGER };
/** At most this many problems travel in a refused import's envelope; the message gives the full count. */
const MAX_ISSUES = 100;

interface CheckedFile {
  preview: ImportPreview;
  /** The bins to create, codes assigned, in file order (only meaningful when the preview can import). */
  bins: CreateBinInput[];
}

/**
 * Checks every row of a bins CSV against the bin rules and against the codes already in use:
 * a code that is taken, or written twice in the file, is a problem on the row that repeats it.
 * Rows without a code get the next free codes, skipping any code the file names.
 */
function checkFile(ctx: ServiceContext, csv: string): CheckedFile {
  const parsed = parseBinCsv(csv);
  const existing = new Set(listBins(ctx.db, ALL_BINS).rows.map((b) => b.code));
  const firstLine = new Map<string, number>();
  for (const row of parsed.rows) {
    if (!BIN_CODE_PATTERN.test(row.code)) continue;
    if (existing.has(row.code)) {
      row.errors.push(problem(row.line, 'code', `${row.code} is already on a bin in the crib. Leave the code empty to get the next free one.`));
    }
    const first = firstLine.get(row.code);
    if (first === undefined) firstLine.set(row.code, row.line);
    else row.errors.push(problem(row.line, 'code', `${row.code} is also on line ${first}; each bin needs its own code.`));
  }

  let next = Number(nextBinCode(ctx.db).slice(2));
  const freeCode = () => {
    let code: string;
    do code = `B-${String(next++).padStart(4, '0')}`;
    while (firstLine.has(code) || existing.has(code));
    return code;
  };

  const bins: CreateBinInput[] = [];
  const rows = parsed.rows.map((r) => {
    const code = r.code || freeCode();
    const ok = r.errors.length === 0 && r.input !== undefined;
    if (ok) bins.push({ ...r.input!, code });
    return { line: r.line, code, designation: r.input ? binDesignation(r.input) : r.name, ok, errors: r.errors };
  });
  const valid = bins.length;
  const invalid = rows.length - valid;
  const canImport = parsed.fileErrors.length === 0 && rows.length > 0 && invalid === 0;
  return { preview: { rows, valid, invalid, columns: parsed.columns, fileErrors: parsed.fileErrors, canImport }, bins };
}

/** What an import would do, row by row; writes nothing. */
export function previewImport(ctx: ServiceContext, csv: string): ImportPreview {
  return checkFile(ctx, csv).preview;
}

function refusal(p: ImportPreview): HttpError {
  const issues = [
    ...p.fileErrors.map((e) => ({ path: e.column ? `file.${e.column}` : 'file', message: e.message })),
    ...p.rows.flatMap((r) => r.errors.map((e) => ({ path: e.column ? `line ${r.line}.${e.column}` : `line ${r.line}`, message: e.message }))),
  ];
  const what = p.fileErrors.length > 0 ? 'the file has problems' : `${p.invalid} of ${p.rows.length} rows have problems`;
  return new HttpError(400, 'IMPORT_INVALID', `Nothing was imported: ${what}. Fix them and check the file again.`, issues.slice(0, MAX_ISSUES));
}

/**
 * Creates every bin of the file, or none: the file is checked again inside the one transaction
 * that creates the bins, so a code taken since the preview refuses the whole file.
 */
export function commitImport(ctx: ServiceContext, actor: UserRow, csv: string): ImportResult {
  return ctx.db.$client
    .transaction(() => {
      const { preview, bins } = checkFile(ctx, csv);
      if (!preview.canImport) throw refusal(preview);
      const codes = bins.map((bin) => insertNewBin(ctx, actor, bin).code);
      return { created: codes.length, codes };
    })
    .immediate();
}
