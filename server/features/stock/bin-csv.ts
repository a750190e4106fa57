import Papa from 'papaparse';
import { guardText, type CsvCell } from '../../lib/csv';
import { slicePauser } from '../../lib/event-loop';
import { MAX_IMPORT_ROWS, type ImportProblem } from '@shared/schemas/bin-import';
import { createBinBodySchema, type CreateBinInput } from '@shared/schemas/bins';
import { BIN_KIND_LABELS, BIN_KINDS, RIVET_HEAD_LABELS, rivetHeadLabel, RIVET_HEADS, RIVET_MATERIALS, STEM_MATERIALS } from '@shared/stock/kinds';

type Field = keyof CreateBinInput;
/** How a cell's text becomes a value for the bin schema. Numeric columns are never formula-escaped on export. */
type CellType = 'text' | 'number' | 'money' | 'dash' | 'inches' | 'diameter' | 'kind' | 'head' | 'material' | 'stem';

export interface BinColumn {
  name: string;
  field: Field;
  type: CellType;
}

const col = (name: string, field: Field, type: CellType = 'text'): BinColumn => ({ name, field, type });

/** The columns of a bins CSV, in file order: import reads them, export writes them. */
export const BIN_COLUMNS: readonly BinColumn[] = [
  col('code', 'code'),
  col('kind', 'kind', 'kind'),
  col('name', 'name'),
  col('head', 'head', 'head'),
  col('material', 'material', 'material'),
  col('stem_material', 'stemMaterial', 'stem'),
  col('diameter_32nds', 'diameter32', 'diameter'),
  col('grip_dash', 'grip16', 'dash'),
  col('grip_min_in', 'gripMin', 'inches'),
  col('grip_max_in', 'gripMax', 'inches'),
  col('length_16ths', 'length16', 'dash'),
  col('drill_size', 'drillSize'),
  col('hole_drill', 'holeDrill'),
  col('unit', 'unit'),
  col('pack_size', 'packSize', 'number'),
  col('unit_cost', 'unitCost', 'money'),
  col('supplier', 'supplier'),
  col('supplier_part', 'supplierPart'),
  col('lead_time_days', 'leadTimeDays', 'number'),
  col('reorder_point', 'reorderPoint', 'number'),
  col('reorder_qty', 'reorderQty', 'number'),
  col('location', 'location'),
  col('notes', 'notes'),
  col('opening_stock', 'initialQuantity', 'number'),
];
/** The columns that describe a bin: what an import may change on a bin that exists (never its code or stock). */
export const DESCRIPTIVE_COLUMNS = BIN_COLUMNS.filter((c) => c.field !== 'code' && c.field !== 'initialQuantity');
export const REQUIRED_COLUMNS = ['kind'] as const;
/** Columns an export adds; an import reads past them. */
export const EXPORT_ONLY_COLUMNS = ['designation', 'on_hand'] as const;
export const isNumericColumn = (c: BinColumn) => ['number', 'money', 'dash', 'inches', 'diameter'].includes(c.type);

/** A field's value as a bins CSV writes it: numbers as numbers, text guarded against formulas, nothing as empty. */
export function binCell(column: BinColumn, value: unknown): CsvCell {
  if (isNumericColumn(column)) return typeof value === 'number' ? value : null;
  return typeof value === 'string' || typeof value === 'number' ? (value === '' ? null : guardText(String(value))) : null;
}

const COLUMN_BY_NAME = new Map(BIN_COLUMNS.map((c) => [c.name, c]));
const COLUMN_BY_FIELD = new Map(BIN_COLUMNS.map((c) => [c.field as string, c.name]));

/** Header names as people type them: "Grip dash", "grip-dash" and "grip_dash" are one column. */
export const normalizeHeader = (h: string) => h.trim().toLowerCase().replace(/[\s-]+/g, '_');
const words = (s: string) => s.trim().toLowerCase().replace(/[–—−]/g, '-').replace(/_/g, ' ').replace(/\s+/g, ' ');

function matchWord<T extends string>(cell: string, values: readonly T[], labels: Partial<Record<T, string>> = {}, aliases: Record<string, T> = {}): T | undefined {
  const w = words(cell);
  return values.find((v) => words(v) === w || (labels[v] !== undefined && words(labels[v]) === w)) ?? aliases[w];
}

const KIND_HINT = `Use one of: ${BIN_KINDS.map((k) => BIN_KIND_LABELS[k]).join(', ')} (or its key, like blind_structural).`;

function toNumber(cell: string): number | undefined {
  const s = cell.replace(/\s/g, '');
  if (/^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(s)) return Number(s.replace(/,/g, ''));
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(s) ? Number(s) : undefined;
}

type Converted = { value: unknown } | { error: string };
const notANumber = (cell: string): Converted => ({ error: `enter a number, not "${cell}".` });

/** A length in inches may carry its unit: "0.063 in" and 0.063" are 0.063. */
const inchesText = (cell: string) => cell.replace(/\s*(in|inch|inches|")$/i, '');

/** A dash number may be written with the trade's leading dash: "-4" is dash 4. */
const dash = (cell: string) => cell.replace(/^[-−]\s*/, '');

function convert(type: CellType, cell: string): Converted {
  switch (type) {
    case 'text':
      // An export guards formulas with a leading apostrophe; take it off again.
      return { value: /^'[=+\-@\t\r]/.test(cell) ? cell.slice(1) : cell };
    case 'number':
    case 'money':
    case 'dash':
    case 'inches': {
      const text = type === 'money' ? cell.replace(/^\$\s*/, '') : type === 'dash' ? dash(cell) : type === 'inches' ? inchesText(cell) : cell;
      const n = toNumber(text);
      return n === undefined ? notANumber(cell) : { value: n };
    }
    case 'diameter': {
      const text = inchesText(dash(cell));
      const fraction = /^(\d+)\s*\/\s*(\d+)$/.exec(text);
      if (!fraction) return toNumber(text) === undefined ? { error: `enter the diameter in 32nds (4) or as a fraction of an inch (1/8), not "${cell}".` } : { value: toNumber(text) };
      const in32nds = (Number(fraction[1]) / Number(fraction[2])) * 32;
      return Number.isInteger(in32nds) ? { value: in32nds } : { error: `${text} in is not a whole number of 32nds of an inch; use a size like 1/8 or 5/32.` };
    }
    case 'kind': {
      const kind = matchWord(cell, BIN_KINDS, BIN_KIND_LABELS);
      return kind ? { value: kind } : { error: `"${cell}" is not a kind of bin. ${KIND_HINT}` };
    }
    case 'head':
      return { value: matchWord(cell, RIVET_HEADS, RIVET_HEAD_LABELS, { universal: 'dome', [rivetHeadLabel('dome', true)]: 'dome', csk: 'countersunk' }) ?? cell };
    case 'material':
      return { value: matchWord(cell, RIVET_MATERIALS, {}, { aluminum: 'aluminium' }) ?? cell };
    case 'stem':
      return { value: matchWord(cell, STEM_MATERIALS, {}, { aluminum: 'aluminium' }) ?? cell };
  }
}

/** "Line 7, grip_dash: use a grip dash from the table: 1 to 6, or 8." */
export function problem(line: number, column: string, message: string): ImportProblem {
  const said = /^[A-Z][a-z\s]/.test(message) ? message[0]!.toLowerCase() + message.slice(1) : message;
  return { column, message: column ? `Line ${line}, ${column}: ${said}` : `Line ${line}: ${message}` };
}

/** One data line read cell by cell: the values its cells give, by bin field, and the cells that could not be read. */
export interface ReadRow {
  line: number;
  /** The code cell as written (upper-cased), or '' when empty. */
  code: string;
  name: string;
  /** Only the cells that hold something; a present column with an empty cell leaves its field out. */
  values: Record<string, unknown>;
  errors: ImportProblem[];
  /** What the file says is on hand (the export's on_hand and opening_stock), for a bin that exists already. */
  statedOnHand: { column: string; quantity: number }[];
}

/** Reads one data line of the file into values by bin field, or into problems in words. */
export function readBinRow(columns: readonly string[], record: CsvRecord): ReadRow {
  const { line, cells, damage } = record;
  const values: Record<string, unknown> = {};
  const errors: ImportProblem[] = [];
  const cellOf = (name: string) => (cells[columns.indexOf(name)] ?? '').trim();
  columns.forEach((name, i) => {
    const column = COLUMN_BY_NAME.get(name);
    const cell = (cells[i] ?? '').trim();
    if (!column || cell === '') return;
    const converted = convert(column.type, cell);
    if ('error' in converted) errors.push(problem(line, name, converted.error));
    else values[column.field] = converted.value;
  });
  const stray = cells.findIndex((c, i) => c.trim() !== '' && !columns[i]);
  if (stray >= 0) errors.push(problem(line, '', `cell ${stray + 1} has no column name in the header line. Name the column or clear the cell.`));
  if (damage) errors.push(problem(line, '', `the CSV is damaged here (${damage}). Check the quotes on this line.`));
  return {
    line,
    code: cellOf('code').toUpperCase(),
    name: cellOf('name'),
    values,
    errors,
    statedOnHand: ['on_hand', 'opening_stock'].flatMap((column) => {
      const quantity = columns.includes(column) ? toNumber(cellOf(column)) : undefined;
      return quantity === undefined ? [] : [{ column, quantity }];
    }),
  };
}

/** The bin the values describe, checked by the bin rules; problems name the file's columns. */
export function binFromValues(row: Pick<ReadRow, 'line' | 'errors'>, values: Record<string, unknown>): { input?: CreateBinInput; errors: ImportProblem[] } {
  const result = createBinBodySchema.safeParse(values);
  if (result.success) return { input: row.errors.length === 0 ? result.data : undefined, errors: row.errors };
  const errors = [...row.errors];
  const badColumns = new Set(errors.map((e) => e.column));
  for (const issue of result.error.issues) {
    const column = COLUMN_BY_FIELD.get(String(issue.path[0] ?? '')) ?? '';
    // A cell that could not be read already has its problem; the schema's "missing" would repeat it.
    if (!badColumns.has(column)) errors.push(problem(row.line, column, issue.message));
  }
  return { errors };
}

/** The bin fields a file's header names: on a bin that exists, these are the ones the row sets. */
export function fieldsOfColumns(columns: readonly string[]): Field[] {
  return columns.flatMap((c) => {
    const column = COLUMN_BY_NAME.get(c);
    return column ? [column.field] : [];
  });
}

export interface CsvRecord {
  line: number;
  cells: string[];
  damage?: string;
}

export interface ParsedCsv {
  columns: string[];
  fileErrors: ImportProblem[];
  /** The data lines, not yet read cell by cell (that is done a slice at a time). */
  records: CsvRecord[];
}

const fileProblem = (message: string, column = ''): ImportProblem => ({ column, message });

/** The header's delimiter: a comma, or the semicolon or tab some spreadsheets write instead. */
function delimiterOf(text: string): string {
  const header = text.slice(0, text.search(/\r?\n|$/));
  return [',', ';', '\t'].reduce((best, d) => (header.split(d).length > header.split(best).length ? d : best), ',');
}

/** Characters parsed between two pauses for other requests (some 250 lines of a bins CSV). */
const PIECE_CHARS = 32_000;

/**
 * Cuts CSV text into pieces of about `size` characters, each ending with a line break outside any
 * quoted cell (a quote toggles quoting; a doubled quote toggles twice), so each piece holds whole
 * records and parses on its own.
 */
export function splitAtRecordEnds(text: string, size: number): string[] {
  const pieces: string[] = [];
  let start = 0;
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 34) quoted = !quoted;
    else if (c === 10 && !quoted && i + 1 - start >= size) {
      pieces.push(text.slice(start, i + 1));
      start = i + 1;
    }
  }
  if (start < text.length) pieces.push(text.slice(start));
  return pieces;
}

/**
 * Splits a bins CSV into lines: the first non-blank line is the header, every other non-blank line
 * a bin. A piece at a time, pausing for other requests between pieces.
 */
export async function parseBinCsv(csv: string): Promise<ParsedCsv> {
  const text = csv.replace(/^\uFEFF/, '');
  const empty = { columns: [], records: [] };
  if (text.trim() === '') return { ...empty, fileErrors: [fileProblem('The file is empty: it needs a header line of column names and one line per bin.')] };

  const records: CsvRecord[] = [];
  const delimiter = delimiterOf(text);
  const pause = slicePauser();
  let line = 1;
  let tooMany = false;
  for (const piece of splitAtRecordEnds(text, PIECE_CHARS)) {
    let pos = 0;
    Papa.parse<string[]>(piece, {
      delimiter,
      step: (step, parser) => {
        const start = line;
        line += piece.slice(pos, step.meta.cursor).split('\n').length - 1;
        pos = step.meta.cursor;
        if (step.data.every((c) => c.trim() === '')) return;
        if (records.length > MAX_IMPORT_ROWS) {
          tooMany = true;
          return parser.abort();
        }
        records.push({ line: start, cells: step.data, damage: step.errors[0]?.message });
      },
    });
    if (tooMany) return { ...empty, fileErrors: [fileProblem(`The file has more than ${MAX_IMPORT_ROWS} bins. Split it into smaller files.`)] };
    line += piece.slice(pos).split('\n').length - 1;
    await pause();
  }

  const [header, ...data] = records;
  const columns = header!.cells.map(normalizeHeader);
  const fileErrors = checkHeader(columns);
  if (data.length === 0) fileErrors.push(fileProblem('The file has a header line but no bins below it.'));
  return { columns, fileErrors, records: data };
}

function checkHeader(columns: readonly string[]): ImportProblem[] {
  const known = new Set<string>([...COLUMN_BY_NAME.keys(), ...EXPORT_ONLY_COLUMNS]);
  const errors: ImportProblem[] = [];
  columns.forEach((c, i) => {
    if (c && !known.has(c)) errors.push(fileProblem(`Line 1, column "${c}" is not one Gripline knows. Rename it to a column of the template, or delete it.`, c));
    if (c && columns.indexOf(c) !== i) errors.push(fileProblem(`Line 1, column "${c}" appears twice. Keep one.`, c));
  });
  for (const c of REQUIRED_COLUMNS) if (!columns.includes(c)) errors.push(fileProblem(`Line 1: the header has no "${c}" column; every bin needs one.`, c));
  return errors;
}
