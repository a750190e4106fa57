import { DEFAULT_WASTE_PERCENT, MM_PER_INCH, type EstimateRivetKind } from './rivet-rules';
import { toThousandth } from '../stock/fasteners';
import { estimateLine, flushSheetNeeds, type EstimateNotice, type LengthUnit, type LineOptions, type RivetLineInput } from './estimate-line';
import type { RivetHead } from '../stock/kinds';
import type { FlushPrep, FlushSheets } from './flush-prep';
import { estimateCautions } from '../safety/estimate-cautions';
import { totalsRules, withRules, type LineRule, type RuledLineEstimate, type WasteOrigin } from './line-rules';

export interface EstimateInput {
  unit: LengthUnit;
  wastePercent?: number;
  lines: RivetLineInput[];
}

export interface EstimateOptions extends Omit<LineOptions, 'unit' | 'finalDrillOverride'> {
  /** The chapter's waste allowance when the input gives none. */
  defaultWastePercent?: number;
  /** A bin's own hole drill per rivet line (same order as the lines), when known. */
  finalDrillOverrides?: (string | null | undefined)[];
}

/** One kind of rivet the assembly needs: what a bin must stock. */
export interface FastenerNeed {
  kind: EstimateRivetKind;
  head: RivetHead;
  material: string | null;
  diameter32: number;
  /** Blind: grip dash; solid: length dash. */
  grip: number | null;
  /** The thinnest and thickest sheet stack of its lines, in inches to the 0.001 in of the grip table. */
  stackMin: number;
  stackMax: number;
  rivets: number;
  withWaste: number;
  lines: number[];
}

export interface EstimateTotals {
  rivets: number;
  rivetsWithWaste: number;
  drillHoles: Record<string, number>;
  tempFasteners: Record<string, number>;
  /** Why: the waste allowance used and how temporary fasteners are counted. */
  rules: readonly LineRule[];
}

export interface EstimateResult {
  /** Each line with the rule and source of every number on it. */
  lines: RuledLineEstimate[];
  totals: EstimateTotals;
  warnings: EstimateNotice[];
  /** Always the plans and approved data, drilling; general-purpose blind rivets when a line has them. */
  cautions: readonly string[];
  /** Not part of the /api/estimate answer: the needs by fastener, the tool sizes, the waste used. */
  needs: FastenerNeed[];
  nosepieces: { kind: 'blind' | 'solid'; diameter32: number; head: RivetHead }[];
  /** Flush lines' countersink cutters and dimple dies by size, with the final drill the cutter's pilot fits; countersinks first, then by size. */
  flushTools: FlushTool[];
  wastePercent: number;
}

export interface FlushTool {
  prep: FlushPrep;
  diameter32: number;
  /** The line's final drill: the cutter's pilot (and the hole the dies' pilot fits). */
  pilot: string;
}

export interface EstimateErrors {
  errors: (EstimateNotice & { line: number })[];
}

const HEAD_INDEX: Record<RivetHead, number> = { dome: 0, countersunk: 1, flange: 2 };
const KIND_INDEX: Record<EstimateRivetKind, number> = { 'blind-structural': 0, 'blind-general': 1, solid: 2 };

/**
 * One key per fastener need. Its strings are made once per distinct spec and kept, so 10,000 lines
 * of a few specs make a few strings, not 10,000.
 */
const needKeys = new Map<string, Map<number, string>>();
function needKey(rivet: RivetLineInput['rivet'], diameter32: number, grip: number | null): string {
  const material = rivet.material ?? '';
  let byMaterial = needKeys.get(material);
  if (!byMaterial) {
    byMaterial = new Map<number, string>();
    // Materials come from people's input: keep at most a few hundred of them.
    if (needKeys.size < 500) needKeys.set(material, byMaterial);
  }
  const code = ((KIND_INDEX[rivet.kind] * 3 + HEAD_INDEX[rivet.head]) * 64 + diameter32) * 256 + (grip === null ? 255 : grip * 2);
  let key = byMaterial.get(code);
  if (key === undefined) {
    key = `${rivet.kind}|${rivet.head}|${material}|${diameter32}|${grip ?? ''}`;
    if (byMaterial.size < 10_000) byMaterial.set(code, key);
  }
  return key;
}

/** A line's sheet stack in inches, to the 0.001 in its grip is read at. */
function stackInches(stack: readonly number[], unit: LengthUnit): number {
  let sum = 0;
  for (const t of stack) sum += t;
  return toThousandth(unit === 'mm' ? sum / MM_PER_INCH : sum);
}

/** Temporary fasteners come out of one line and go into the next (common practice): per size, the most any one line needs. */
function atOnce(into: Record<string, number>, from: Record<string, number>): void {
  for (const k in from) into[k] = Math.max(into[k] ?? 0, from[k]!);
}

/**
 * The whole estimate: every line, the totals, the needs by fastener with the waste allowance
 * applied to each need and rounded up. Lines the rules refuse come back as errors instead.
 */
export function estimate(input: EstimateInput, options: EstimateOptions = {}): EstimateResult | EstimateErrors {
  const wastePercent = input.wastePercent ?? options.defaultWastePercent ?? DEFAULT_WASTE_PERCENT;
  const wasteOrigin: WasteOrigin = input.wastePercent !== undefined ? 'request' : options.defaultWastePercent !== undefined ? 'chapter' : 'default';
  const shared: LineOptions = { ...options, unit: input.unit };
  const overrides = options.finalDrillOverrides;
  const optionsOf = (i: number): LineOptions => (overrides?.[i] ? { ...shared, finalDrillOverride: overrides[i] } : shared);
  const results = input.lines.map((line, i) => estimateLine(line, optionsOf(i)));
  const errors: EstimateErrors['errors'] = [];
  for (let i = 0; i < results.length; i++) {
    const r = results[i]!;
    if ('error' in r) errors.push({ code: r.code, message: `Line ${i + 1}: ${r.message}`, line: i });
  }
  if (errors.length > 0) return { errors };
  const lines = results as RuledLineEstimate[];

  const totals: EstimateTotals = { rivets: 0, rivetsWithWaste: 0, drillHoles: {}, tempFasteners: {}, rules: totalsRules(wastePercent, wasteOrigin) };
  const needs = new Map<string, FastenerNeed>();
  const nosepieces = new Map<number, EstimateResult['nosepieces'][number]>();
  const flushTools: FlushTool[] = [];
  for (let i = 0; i < lines.length; i++) {
    const l = withRules(input.lines[i]!, lines[i]!, optionsOf(i));
    const rivet = input.lines[i]!.rivet;
    // A repair line's rivets are the next size up: the needs and tools follow the diameter used.
    const diameter32 = l.diameter32 ?? rivet.diameter32;
    totals.rivets += l.holes;
    for (const step of l.drillSequence) totals.drillHoles[step] = (totals.drillHoles[step] ?? 0) + l.holes;
    atOnce(totals.tempFasteners, l.tempFasteners);
    const key = needKey(rivet, diameter32, l.grip);
    const stack = stackInches(input.lines[i]!.stack, input.unit);
    const need = needs.get(key) ?? { kind: rivet.kind, head: rivet.head, material: rivet.material ?? null, diameter32, grip: l.grip, stackMin: stack, stackMax: stack, rivets: 0, withWaste: 0, lines: [] };
    need.stackMin = Math.min(need.stackMin, stack);
    need.stackMax = Math.max(need.stackMax, stack);
    need.rivets += l.holes;
    need.lines.push(i);
    needs.set(key, need);
    const family = rivet.kind === 'solid' ? 'solid' : 'blind';
    const toolKey = (family === 'solid' ? 1000 + HEAD_INDEX[rivet.head] * 100 : 0) + diameter32;
    if (!nosepieces.has(toolKey)) nosepieces.set(toolKey, { kind: family, diameter32, head: rivet.head });
    if (l.flushPrep !== null) addFlushTools(flushTools, flushSheetNeeds(input.lines[i]!, l.flushPrep, diameter32, input.unit), diameter32, l.drillSequence.at(-1)!);
  }
  for (const need of needs.values()) {
    need.withWaste = Math.ceil(need.rivets * (1 + wastePercent / 100) - 1e-9);
    totals.rivetsWithWaste += need.withWaste;
  }
  const warnings: EstimateNotice[] = [];
  for (let i = 0; i < lines.length; i++) {
    const ws = lines[i]!.warnings;
    if (ws.length === 0) continue;
    const prefix = linePrefix(i);
    for (const w of ws) warnings.push({ code: w.code, message: prefix + w.message });
  }
  const flush = flushTools.sort((a, b) => Number(a.prep === 'dimple') - Number(b.prep === 'dimple') || a.diameter32 - b.diameter32);
  return { lines, totals, warnings, cautions: estimateCautions(input.lines), needs: [...needs.values()], nosepieces: [...nosepieces.values()], flushTools: flush, wastePercent };
}

/** Adds the cutters and dies a flush line needs, once each: there are only a few, so a plain search makes no key per line. */
function addFlushTools(into: FlushTool[], sheets: FlushSheets, diameter32: number, pilot: string): void {
  if (sheets.countersink) addFlushTool(into, 'countersink', diameter32, pilot);
  if (sheets.dimple) addFlushTool(into, 'dimple', diameter32, pilot);
}
function addFlushTool(into: FlushTool[], prep: FlushPrep, diameter32: number, pilot: string): void {
  for (const t of into) if (t.prep === prep && t.diameter32 === diameter32 && t.pilot === pilot) return;
  into.push({ prep, diameter32, pilot });
}

/** "Line 12: ", made once per line number and kept (at most the 20,000 lines an estimate takes), so warnings do not format a number each. */
const linePrefixes: string[] = [];
function linePrefix(i: number): string {
  return (linePrefixes[i] ??= `Line ${i + 1}: `);
}

export const isEstimateErrors = (r: EstimateResult | EstimateErrors): r is EstimateErrors => 'errors' in r;
