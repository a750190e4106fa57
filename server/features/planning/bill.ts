import type { FastenerNeed } from '@shared/estimate/estimate';
import type { EstimateRivetKind } from '@shared/estimate/rivet-rules';
import type { BillLine, ExtraItem } from '@shared/schemas/builds';
import { BLIND_GRIP_RANGES, binDesignation, binGripRange, blindGripRange, fastenerDesignation, gripRangeWords, inchFraction, toThousandth as thou, type FastenerSpec } from '@shared/stock/fasteners';
import { rivetHeadLabel, type RivetKind } from '@shared/stock/kinds';
import type { Executor } from '../../db/client';
import { binsWithCodes, drawnForAssembly, rivetBins as loadRivetBins, type BinRow } from '../stock/stock.reads';

/** The bin kind that stocks each kind of rivet the estimator names. */
export const BIN_KIND_FOR: Record<EstimateRivetKind, RivetKind> = {
  'blind-structural': 'blind_structural',
  'blind-general': 'blind_general',
  solid: 'solid_rivet',
};
const KIND_WORDS: Record<EstimateRivetKind, string> = {
  'blind-structural': 'structural blind rivet',
  'blind-general': 'general-purpose blind rivet',
  solid: 'solid rivet',
};

/** A fastener need, the bins that stock it (best first) and, for a blind rivet, the bins of it stocked for other grips. */
export interface NeedMatch {
  need: FastenerNeed;
  bins: BinRow[];
  /** Blind rivets: bins of the same rivet whose grip range does not cover the need's stacks. */
  otherGrips: BinRow[];
}

function specOf(need: FastenerNeed): FastenerSpec {
  const solid = need.kind === 'solid';
  return { kind: BIN_KIND_FOR[need.kind], head: need.head, material: need.material, stemMaterial: null, diameter32: need.diameter32, grip16: solid ? null : need.grip, length16: solid ? need.grip : null };
}

/** Kind, head and diameter must match; material too when the line names one. */
function sameRivet(bin: BinRow, need: FastenerNeed): boolean {
  if (bin.kind !== BIN_KIND_FOR[need.kind] || bin.head !== need.head || bin.diameter32 !== need.diameter32) return false;
  return need.material === null || bin.material?.toLowerCase() === need.material.toLowerCase();
}

/** A blind bin covers a need when its grip range (from the box, else the table's band) holds every line's stack. */
function gripCovers(bin: BinRow, need: FastenerNeed): boolean {
  const range = binGripRange(bin);
  return range !== undefined && thou(range.min) <= thou(need.stackMin) && thou(need.stackMax) <= thou(range.max);
}

/** The same rivet, and a solid rivet's length dash or a blind rivet's grip range to suit. */
function binStocksNeed(bin: BinRow, need: FastenerNeed): boolean {
  if (!sameRivet(bin, need)) return false;
  if (need.kind !== 'solid') return gripCovers(bin, need);
  return need.grip !== null && bin.length16 === need.grip;
}

/** The bin to take from first: the one with the most on hand. */
const mostOnHand = (a: BinRow, b: BinRow) => b.onHand - a.onHand || a.code.localeCompare(b.code);

/** Among blind bins that cover the stack: one with stock first, then the tightest range, then the most on hand. */
function bestBlind(a: BinRow, b: BinRow): number {
  const width = (bin: BinRow) => {
    const r = binGripRange(bin)!;
    return Math.round((r.max - r.min) * 1000);
  };
  return Number(b.onHand > 0) - Number(a.onHand > 0) || width(a) - width(b) || mostOnHand(a, b);
}

/** The bins that stock the need, best first. */
export function binsStocking(rivetBins: readonly BinRow[], need: FastenerNeed): BinRow[] {
  return rivetBins.filter((b) => binStocksNeed(b, need)).sort(need.kind === 'solid' ? mostOnHand : bestBlind);
}

export function matchNeeds(db: Executor, needs: FastenerNeed[]): NeedMatch[] {
  const rivetBins = loadRivetBins(db);
  return needs.map((need) => ({
    need,
    bins: binsStocking(rivetBins, need),
    otherGrips: need.kind === 'solid' ? [] : rivetBins.filter((b) => sameRivet(b, need) && !gripCovers(b, need)).sort((a, b) => a.code.localeCompare(b.code)),
  }));
}

/** Each rivet line's final drill from the bin that stocks its rivet, where the bin names one. */
export function drillOverrides(matches: NeedMatch[], lineCount: number): (string | null)[] {
  const overrides = Array.from({ length: lineCount }, (): string | null => null);
  for (const { need, bins: found } of matches) {
    const holeDrill = found[0]?.holeDrill;
    if (holeDrill) for (const line of need.lines) overrides[line] = holeDrill;
  }
  return overrides;
}

const inches = (x: number) => x.toFixed(3);

/** The need's stacks and the table's band for its dash: "the 0.130 in stack: the −3 band is 0.126–0.187 in". */
function stackAgainstBand(need: FastenerNeed): string {
  const stack = need.stackMin === need.stackMax ? `the ${inches(need.stackMin)} in stack` : `the ${gripRangeWords({ min: need.stackMin, max: need.stackMax })} stacks`;
  const band = need.grip === null ? undefined : blindGripRange(need.grip);
  if (band) return `${stack}: the −${need.grip} band is ${gripRangeWords(band)}`;
  const longest = BLIND_GRIP_RANGES.at(-1)!;
  return `${stack}, beyond the longest band (−${longest.dash}, ${gripRangeWords(longest)})`;
}

const rangeWords = (bin: BinRow) => gripRangeWords(binGripRange(bin)!);

/**
 * Plainly, what no bin stocks: "No bin stocks a 1/8 in dome 5056 structural blind rivet with grip
 * −3." When bins of the blind rivet are stocked for other grips, the stack is what none covers, and
 * those bins are named: "No bin's grip range covers the 0.130 in stack: the −3 band is 0.126–0.187
 * in. Bin B-0107 has this rivet for 0.063–0.125 in."
 */
export function unstockedMessage(need: FastenerNeed, otherGrips: readonly BinRow[]): string {
  if (otherGrips.length > 0) {
    const others =
      otherGrips.length === 1
        ? `Bin ${otherGrips[0]!.code} has this rivet for ${rangeWords(otherGrips[0]!)}.`
        : `Bins ${otherGrips.map((b) => `${b.code} (${rangeWords(b)})`).join(', ')} have this rivet for other stacks.`;
    return `No bin's grip range covers ${stackAgainstBand(need)}. ${others}`;
  }
  const material = need.material ? `${need.material} ` : '';
  const size =
    need.grip === null
      ? ' for a stack beyond the longest grip'
      : need.kind === 'solid'
        ? ` ${inchFraction(need.grip, 16)} in long (−${need.grip})`
        : ` with grip −${need.grip}`;
  return `No bin stocks a ${inchFraction(need.diameter32, 32)} in ${rivetHeadLabel(need.head, need.kind === 'solid')} ${material}${KIND_WORDS[need.kind]}${size}.`;
}

const binRef = (b: BinRow) => ({ code: b.code, designation: binDesignation(b), onHand: b.onHand, location: b.location });

/**
 * How many the bin lacks for what is still to draw: the need less what was already drawn for the
 * assembly, against what is on hand. A line drawn in full lacks nothing, whatever the bin holds now.
 */
function stillToDraw(need: number, drawnSoFar: number, bin: BinRow | null | undefined) {
  const toDraw = Math.max(0, need - drawnSoFar);
  return { drawn: drawnSoFar, toDraw, shortBy: Math.max(0, toDraw - (bin?.onHand ?? 0)) };
}

/**
 * The bill: each fastener need with the bin that stocks it (or why none does), then the extra
 * items by bin code. `drawn` counts every bin that stocks the need, so a draw from a second bin of
 * the same rivet still counts against the assembly.
 */
export function billLines(db: Executor, assemblyId: number, matches: NeedMatch[], extras: ExtraItem[]): BillLine[] {
  const drawn = drawnForAssembly(db, assemblyId);
  const fasteners = matches.map(({ need, bins: found, otherGrips }): BillLine => {
    const bin = found[0] ?? null;
    const unstocked = bin ? null : unstockedMessage(need, otherGrips);
    const drawnSoFar = found.reduce((sum, b) => sum + (drawn.get(b.id) ?? 0), 0);
    return {
      description: bin ? binRef(bin).designation : (fastenerDesignation(specOf(need)) ?? unstocked!),
      kind: BIN_KIND_FOR[need.kind],
      diameter32: need.diameter32,
      grip: need.grip,
      lines: need.lines,
      estimated: need.rivets,
      withWaste: need.withWaste,
      bin: bin && binRef(bin),
      unstocked,
      ...stillToDraw(need.withWaste, drawnSoFar, bin),
    };
  });
  const byCode = binsWithCodes(db, extras.map((e) => e.binCode));
  const items = extras.map((e): BillLine => {
    const bin = byCode.get(e.binCode);
    const drawnSoFar = bin ? (drawn.get(bin.id) ?? 0) : 0;
    return {
      description: bin ? binRef(bin).designation : e.binCode,
      kind: bin?.kind ?? 'other',
      diameter32: bin?.diameter32 ?? null,
      grip: bin ? (bin.grip16 ?? bin.length16) : null,
      lines: [],
      estimated: e.quantity,
      withWaste: e.quantity,
      bin: bin ? binRef(bin) : null,
      unstocked: bin ? null : `No bin has the code ${e.binCode}.`,
      ...stillToDraw(e.quantity, drawnSoFar, bin),
    };
  });
  return [...fasteners, ...items];
}
