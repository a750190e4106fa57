import { get, set, type FieldErrors } from 'react-hook-form';
import type { z } from 'zod';
import type { FlushPrep } from '@shared/estimate/flush-prep';
import type { EstimateRivetKind, RowPattern } from '@shared/estimate/rivet-rules';
import { MM_PER_INCH } from '@shared/estimate/rivet-rules';
import { createAssemblyBodySchema, type Assembly, type AssemblyLine, type AssemblyStatus, type assemblyLineSchema, type CreateAssemblyInput, type LengthUnit } from '@shared/schemas/builds';
import type { RivetHead } from '@shared/stock/kinds';

/** What the form holds: text as typed, so an empty box stays empty and the schema says what is missing. */
export interface SheetValue {
  thickness: string;
}
export interface LineValues {
  label: string;
  length: string;
  rows: string;
  /** Rows side by side, or staggered by half a pitch; asked only when there is more than one row. */
  rowPattern: RowPattern;
  /** Between rows; empty for 75 % of the pitch, at least 2.5D. */
  rowSpacing: string;
  /** Give a target pitch, or say how many holes each row has. */
  spacing: 'pitch' | 'holes';
  pitch: string;
  holesPerRow: string;
  edgeDistance: string;
  stack: SheetValue[];
  structural: boolean;
  /** Countersunk heads: the plans' choice for the top sheet; empty for what the minimum-gage rule says. */
  flushPrep: FlushPrep | '';
  /** The line replaces drilled-out rivets (worked one diameter up). */
  repair: boolean;
  kind: EstimateRivetKind;
  head: RivetHead;
  material: string;
  diameter32: string;
}
export interface ExtraItemValues {
  binCode: string;
  quantity: string;
}
export interface AssemblyFormValues {
  name: string;
  status: AssemblyStatus;
  plannedStart: string;
  plannedFinish: string;
  unit: LengthUnit;
  notes: string;
  lines: LineValues[];
  extraItems: ExtraItemValues[];
}

export const emptyLine = (): LineValues => ({
  label: '',
  length: '',
  rows: '1',
  rowPattern: 'inline',
  rowSpacing: '',
  spacing: 'pitch',
  pitch: '',
  holesPerRow: '',
  edgeDistance: '',
  stack: [{ thickness: '' }],
  structural: true,
  flushPrep: '',
  repair: false,
  kind: 'blind-structural',
  head: 'dome',
  material: '',
  diameter32: '4',
});

/** Typed text as a number; empty is NaN so the schema answers "Enter the … as a number". A decimal comma is read as a point. */
const num = (text: string): number => (text.trim() === '' ? Number.NaN : Number(text.trim().replace(',', '.')));
const optionalNum = (text: string): number | undefined => (text.trim() === '' ? undefined : num(text));
const optionalText = (text: string): string | undefined => (text.trim() === '' ? undefined : text.trim());

/** Whether the line's rows text asks for more than one row: only then are the pattern and the row spacing asked for and sent. */
export const hasManyRows = (rowsText: string): boolean => num(rowsText) > 1;

export function toLine(v: LineValues): z.input<typeof assemblyLineSchema> {
  const many = hasManyRows(v.rows);
  return {
    label: optionalText(v.label),
    length: num(v.length),
    rows: optionalNum(v.rows),
    rowPattern: many && v.rowPattern === 'staggered' ? 'staggered' : undefined,
    rowSpacing: many ? optionalNum(v.rowSpacing) : undefined,
    pitch: v.spacing === 'pitch' ? num(v.pitch) : undefined,
    holesPerRow: v.spacing === 'holes' ? num(v.holesPerRow) : undefined,
    edgeDistance: optionalNum(v.edgeDistance),
    stack: v.stack.map((s) => num(s.thickness)),
    structural: v.structural,
    // Sent only where it means something: a flush choice on a countersunk head, a repair when ticked.
    flushPrep: v.head === 'countersunk' && v.flushPrep !== '' ? v.flushPrep : undefined,
    repair: v.repair ? true : undefined,
    rivet: { kind: v.kind, head: v.head, diameter32: Number(v.diameter32), material: optionalText(v.material) },
  };
}

export function toBody(v: AssemblyFormValues): z.input<typeof createAssemblyBodySchema> {
  return {
    name: v.name,
    status: v.status,
    plannedStart: v.plannedStart || null,
    plannedFinish: v.plannedFinish || null,
    unit: v.unit,
    notes: v.notes,
    lines: v.lines.map(toLine),
    extraItems: v.extraItems.map((x) => ({ binCode: x.binCode.trim().toUpperCase(), quantity: num(x.quantity) })),
  };
}

const text = (x: number | undefined) => (x === undefined ? '' : String(x));

export function fromLine(line: AssemblyLine): LineValues {
  return {
    label: line.label ?? '',
    length: String(line.length),
    rows: String(line.rows ?? 1),
    rowPattern: line.rowPattern ?? 'inline',
    rowSpacing: text(line.rowSpacing),
    spacing: line.holesPerRow !== undefined ? 'holes' : 'pitch',
    pitch: text(line.pitch),
    holesPerRow: text(line.holesPerRow),
    edgeDistance: text(line.edgeDistance),
    stack: line.stack.map((t) => ({ thickness: String(t) })),
    structural: line.structural ?? false,
    flushPrep: line.flushPrep ?? '',
    repair: line.repair ?? false,
    kind: line.rivet.kind,
    head: line.rivet.head,
    material: line.rivet.material ?? '',
    diameter32: String(line.rivet.diameter32),
  };
}

export function formDefaults(assembly: Assembly | undefined, unit: LengthUnit): AssemblyFormValues {
  if (!assembly) {
    return { name: '', status: 'planned', plannedStart: '', plannedFinish: '', unit, notes: '', lines: [emptyLine()], extraItems: [] };
  }
  return {
    name: assembly.name,
    status: assembly.status,
    plannedStart: assembly.plannedStart?.slice(0, 10) ?? '',
    plannedFinish: assembly.plannedFinish?.slice(0, 10) ?? '',
    unit: assembly.unit,
    notes: assembly.notes,
    lines: assembly.lines.map(fromLine),
    extraItems: assembly.extraItems.map((x) => ({ binCode: x.binCode, quantity: String(x.quantity) })),
  };
}

/** Where a schema issue shows on the form: the rivet's fields sit on the line, each sheet on its box. */
export function formPath(path: readonly PropertyKey[]): string {
  const parts = path.map(String);
  if (parts[0] === 'lines' && parts[2] === 'rivet' && parts[3]) return `lines.${parts[1]}.${parts[3]}`;
  if (parts[0] === 'lines' && parts[2] === 'stack') return parts[3] === undefined ? `lines.${parts[1]}.stack.root` : `lines.${parts[1]}.stack.${parts[3]}.thickness`;
  // A refusal of a whole list sits on the list, not on one of its entries.
  if (parts.length === 1 && (parts[0] === 'lines' || parts[0] === 'extraItems')) return `${parts[0]}.root`;
  return parts.join('.') || 'root';
}

/** The form's errors from the shared schema, the first message per field. */
export function schemaErrors(values: AssemblyFormValues): { values: CreateAssemblyInput; errors: null } | { values: null; errors: FieldErrors<AssemblyFormValues> } {
  const parsed = createAssemblyBodySchema.safeParse(toBody(values));
  if (parsed.success) return { values: parsed.data, errors: null };
  const errors: FieldErrors<AssemblyFormValues> = {};
  for (const issue of parsed.error.issues) {
    const at = formPath(issue.path);
    if (!get(errors, at)) set(errors, at, { type: issue.code, message: issue.message });
  }
  return { values: null, errors };
}

/** The message to show at a field, wherever it sits in the nested errors. */
export function errorAt(errors: FieldErrors<AssemblyFormValues>, path: string): string | undefined {
  const found: { message?: string } | undefined = get(errors, path);
  return found?.message;
}

/** A length typed in one unit, in the other: inches to 0.0001 in, millimetres to 0.01 mm. */
export function convertLength(textValue: string, to: LengthUnit): string {
  const x = num(textValue);
  if (!Number.isFinite(x)) return textValue;
  const converted = to === 'mm' ? x * MM_PER_INCH : x / MM_PER_INCH;
  const places = to === 'mm' ? 100 : 10_000;
  return String(Math.round(converted * places) / places);
}

/** Every length on a line, moved to the other unit, so changing the unit keeps the same lines. */
export function convertLine(line: LineValues, to: LengthUnit): LineValues {
  return {
    ...line,
    length: convertLength(line.length, to),
    pitch: convertLength(line.pitch, to),
    edgeDistance: convertLength(line.edgeDistance, to),
    rowSpacing: convertLength(line.rowSpacing, to),
    stack: line.stack.map((s) => ({ thickness: convertLength(s.thickness, to) })),
  };
}
