import type { ImportChange, ImportProblem, ImportRowStatus } from '@shared/schemas/bin-import';
import { gripRangeAfterEdit, type BinFields, type BinListQuery, type CreateBinInput } from '@shared/schemas/bins';
import { binDesignation } from '@shared/stock/fasteners';
import { BIN_CODE_PATTERN, BIN_KIND_LABELS, type BinKind } from '@shared/stock/kinds';
import { dollarsToE4 } from '@shared/stock/money';
import type { ServiceContext } from '../../context';
import type { Database } from '../../db/client';
import type { BinRow } from '../../db/schema/stock';
import { mapInSlices } from '../../lib/event-loop';
import { toBinFields } from './bin-dto';
import { binFromValues, DESCRIPTIVE_COLUMNS, fieldsOfColumns, parseBinCsv, problem, readBinRow, type ReadRow } from './bin-csv';
import { listBins, nextBinCode, sameSpecBins, type BinSpec } from './bins.repo';

export const ALL_BINS: BinListQuery = { page: 1, pageSize: Number.MAX_SAFE_INTEGER };

/** One row of the file as the import would apply it. */
export interface CheckedRow {
  line: number;
  /** As written; a new row without one gets the next free code (`assignCodes`). */
  code: string;
  status: ImportRowStatus;
  designation: string;
  /** The bin as the row leaves it (new, update and unchanged rows). */
  input?: CreateBinInput;
  /** The bin as it was when the file was checked (update and unchanged rows). */
  before?: BinRow;
  changes: ImportChange[];
  warnings: ImportProblem[];
  errors: ImportProblem[];
}

export interface CheckedFile {
  columns: string[];
  fileErrors: ImportProblem[];
  rows: CheckedRow[];
}

/** What a bin's descriptive fields say, in the import's terms (dollars, not hundredths of a cent). */
export function descriptiveFields(row: BinRow): Record<string, unknown> {
  const fields: BinFields = toBinFields(row);
  return Object.fromEntries(DESCRIPTIVE_COLUMNS.map((c) => [c.field, fields[c.field as keyof BinFields]]));
}

const shown = (value: unknown) => (typeof value === 'string' || typeof value === 'number' ? String(value) : '');
const same = (type: string, a: unknown, b: unknown) =>
  type === 'money' && typeof a === 'number' && typeof b === 'number' ? dollarsToE4(a) === dollarsToE4(b) : (a ?? null) === (b ?? null);

function changesBetween(before: Record<string, unknown>, after: CreateBinInput): ImportChange[] {
  return DESCRIPTIVE_COLUMNS.flatMap((c) => {
    const to = after[c.field];
    return same(c.type, before[c.field], to) ? [] : [{ column: c.name, from: shown(before[c.field]), to: shown(to) }];
  });
}

/** The fields that say what a bin holds; changing one may make it the twin of another bin. */
const SPEC_COLUMNS = new Set(['kind', 'name', 'head', 'material', 'stem_material', 'diameter_32nds', 'grip_dash', 'grip_min_in', 'grip_max_in', 'length_16ths', 'drill_size']);

/**
 * Which existing bins could hold the same thing as a row: equal in every spec column, and in the
 * name folded to lower case. The rule itself is `sameSpecBins` (SQL); this key is looser (it folds
 * more than SQLite's lower()), so a row with no candidate needs no query: 5,000 new screws against
 * 5,000 in the crib take one query each only where a name is already there.
 */
type SpecKeyed = Pick<BinSpec, 'kind' | 'head' | 'material' | 'stemMaterial' | 'diameter32' | 'grip16' | 'gripMin' | 'gripMax' | 'length16' | 'drillSize' | 'name'>;
const candidateKey = (b: SpecKeyed) =>
  JSON.stringify([b.kind, b.head, b.material, b.stemMaterial, b.diameter32, b.grip16, b.gripMin, b.gripMax, b.length16, b.drillSize, b.diameter32 === null ? b.name.toLowerCase() : '']);

interface Crib {
  byCode: ReadonlyMap<string, BinRow>;
  candidates: ReadonlySet<string>;
}

function sameSpecWarnings(db: Database, crib: Crib, line: number, bin: CreateBinInput, id = -1): ImportProblem[] {
  if (!crib.candidates.has(candidateKey(bin))) return [];
  const twins = sameSpecBins(db, { ...bin, id });
  if (twins.length === 0) return [];
  const codes = twins.slice(0, 3).map((b) => b.code);
  const who = twins.length === 1 ? `bin ${codes[0]} already holds` : `bins ${codes.join(', ')}${twins.length > 3 ? ' and more' : ''} already hold`;
  return [problem(line, '', `${who} this (${binDesignation(twins[0]!)}). Import the row only if you mean a second bin of it.`)];
}

function onHandWarnings(row: ReadRow, before: BinRow): ImportProblem[] {
  const stated = row.statedOnHand.find((s) => s.quantity !== before.onHand);
  if (!stated) return [];
  return [
    problem(row.line, stated.column, `the file says ${stated.quantity} on hand and the bin holds ${before.onHand}. Stock moves only through the ledger, so this is ignored: count the bin to correct it.`),
  ];
}

const problemRow = (row: ReadRow, errors: ImportProblem[]): CheckedRow => ({
  line: row.line,
  code: row.code,
  status: 'problem',
  designation: row.name,
  changes: [],
  warnings: [],
  errors,
});

/**
 * A row whose code is on a bin updates that bin: the columns the file has replace the bin's values
 * (an empty cell clears the field, as it would on a new bin), the others keep theirs, and the result
 * must still be a valid bin. Stock never changes here: on hand moves only through the ledger.
 */
function checkRow(db: Database, crib: Crib, setFields: readonly string[], row: ReadRow): CheckedRow {
  const before = row.code ? crib.byCode.get(row.code) : undefined;
  if (!before) {
    const { input, errors } = binFromValues(row, row.values);
    if (!input) return problemRow(row, errors);
    return { line: row.line, code: row.code, status: 'new', designation: binDesignation(input), input, changes: [], warnings: sameSpecWarnings(db, crib, row.line, input), errors: [] };
  }
  const current = descriptiveFields(before);
  const kept = Object.fromEntries(Object.entries(current).filter(([field]) => !setFields.includes(field)));
  // A column the file has but leaves empty is sent as empty; a new grip dash without a range takes the table's.
  const sent = { ...Object.fromEntries(setFields.map((f) => [f, null])), ...row.values };
  const range = gripRangeAfterEdit(before, sent);
  const { input, errors } = binFromValues(row, { ...kept, ...row.values, ...range });
  if (!input) return problemRow(row, errors);
  // A code names one kind of thing: a row of another kind is a different bin (often another crib's file), never an edit.
  if (input.kind !== before.kind) {
    const kind = (k: BinKind) => BIN_KIND_LABELS[k].toLowerCase();
    return problemRow(row, [problem(row.line, 'kind', `${row.code} is a bin of ${kind(before.kind)}, not ${kind(input.kind)}. Leave the code empty to add a new bin, or keep the bin's kind.`)]);
  }
  const changes = changesBetween(current, input);
  const twins = changes.some((c) => SPEC_COLUMNS.has(c.column)) ? sameSpecWarnings(db, crib, row.line, input, before.id) : [];
  return {
    line: row.line,
    code: row.code,
    status: changes.length > 0 ? 'update' : 'unchanged',
    designation: binDesignation(input),
    input,
    before,
    changes,
    warnings: [...onHandWarnings(row, before), ...twins],
    errors: [],
  };
}

/** A code written twice in the file is a problem on the row that repeats it. */
function refuseRepeatedCodes(rows: CheckedRow[]): void {
  const firstLine = new Map<string, number>();
  for (const row of rows) {
    if (!BIN_CODE_PATTERN.test(row.code)) continue;
    const first = firstLine.get(row.code);
    if (first === undefined) firstLine.set(row.code, row.line);
    else {
      row.errors.push(problem(row.line, 'code', `${row.code} is also on line ${first}; each bin needs its own code.`));
      row.status = 'problem';
    }
  }
}

/** Gives new rows without a code the next free codes, skipping every code in use or named in the file. Returns the rows with their codes. */
export function assignCodes(db: Database, rows: readonly CheckedRow[], inUse: (code: string) => boolean): CheckedRow[] {
  const named = new Set(rows.map((r) => r.code).filter(Boolean));
  let next = Number(nextBinCode(db).slice(2));
  const freeCode = () => {
    let code: string;
    do code = `B-${String(next++).padStart(4, '0')}`;
    while (named.has(code) || inUse(code));
    return code;
  };
  return rows.map((r) => (r.code ? r : { ...r, code: freeCode() }));
}

/**
 * Reads and checks every row of a bins CSV against the bins as they are now, a slice at a time so
 * the server keeps answering other requests. Writes nothing.
 */
export async function checkBinFile(ctx: ServiceContext, csv: string): Promise<CheckedFile> {
  const parsed = await parseBinCsv(csv);
  const bins = listBins(ctx.db, ALL_BINS).rows;
  const crib: Crib = { byCode: new Map(bins.map((b) => [b.code, b])), candidates: new Set(bins.map(candidateKey)) };
  const setFields = fieldsOfColumns(parsed.columns);
  const rows = await mapInSlices(parsed.records, (record) => checkRow(ctx.db, crib, setFields, readBinRow(parsed.columns, record)));
  refuseRepeatedCodes(rows);
  return { columns: parsed.columns, fileErrors: parsed.fileErrors, rows: assignCodes(ctx.db, rows, (code) => crib.byCode.has(code)) };
}
