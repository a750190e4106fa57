import { and, eq, inArray, sql } from 'drizzle-orm';
import type { FastenerNeed } from '@shared/estimate/estimate';
import type { EstimateRivetKind } from '@shared/estimate/rivet-rules';
import type { BillLine, ExtraItem } from '@shared/schemas/builds';
import { binDesignation, fastenerDesignation, inchFraction, type FastenerSpec } from '@shared/stock/fasteners';
import { rivetHeadLabel, RIVET_KINDS, type RivetKind } from '@shared/stock/kinds';
import type { Executor } from '../../db/client';
import { bins, stockMovements, type BinRow } from '../../db/schema/stock';

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

/** A fastener need and the bins that stock it, best first (most on hand). */
export interface NeedMatch {
  need: FastenerNeed;
  bins: BinRow[];
}

function specOf(need: FastenerNeed): FastenerSpec {
  const solid = need.kind === 'solid';
  return { kind: BIN_KIND_FOR[need.kind], head: need.head, material: need.material, stemMaterial: null, diameter32: need.diameter32, grip16: solid ? null : need.grip, length16: solid ? need.grip : null };
}

/** Kind, head, diameter and grip (blind: grip dash; solid: length dash) must match; material too when the line names one. */
function binStocksNeed(bin: BinRow, need: FastenerNeed): boolean {
  if (bin.kind !== BIN_KIND_FOR[need.kind] || bin.head !== need.head || bin.diameter32 !== need.diameter32) return false;
  if (need.material !== null && bin.material?.toLowerCase() !== need.material.toLowerCase()) return false;
  const grip = need.kind === 'solid' ? bin.length16 : bin.grip16;
  return need.grip !== null && grip === need.grip;
}

/** The bin to take from first: the one with the most on hand. */
const mostOnHand = (a: BinRow, b: BinRow) => b.onHand - a.onHand || a.code.localeCompare(b.code);

/** The bins of the need's spec, best first (most on hand). */
export function binsStocking(rivetBins: readonly BinRow[], need: FastenerNeed): BinRow[] {
  return rivetBins.filter((b) => binStocksNeed(b, need)).sort(mostOnHand);
}

export function matchNeeds(db: Executor, needs: FastenerNeed[]): NeedMatch[] {
  const rivetBins = db.select().from(bins).where(inArray(bins.kind, [...RIVET_KINDS])).all();
  return needs.map((need) => ({ need, bins: binsStocking(rivetBins, need) }));
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

/** Plainly, what no bin stocks: "No bin stocks a 1/8 in dome 5056 structural blind rivet with grip −3." */
export function unstockedMessage(need: FastenerNeed): string {
  const material = need.material ? `${need.material} ` : '';
  const size =
    need.grip === null
      ? ' for a stack beyond the longest grip'
      : need.kind === 'solid'
        ? ` ${inchFraction(need.grip, 16)} in long (−${need.grip})`
        : ` with grip −${need.grip}`;
  return `No bin stocks a ${inchFraction(need.diameter32, 32)} in ${rivetHeadLabel(need.head, need.kind === 'solid')} ${material}${KIND_WORDS[need.kind]}${size}.`;
}

/** Units drawn for the assembly from each bin, net of returns and reversals. */
function drawnByBin(db: Executor, assemblyId: number): Map<number, number> {
  const rows = db
    .select({ binId: stockMovements.binId, n: sql<number>`-sum(${stockMovements.quantity})` })
    .from(stockMovements)
    .where(and(eq(stockMovements.assemblyId, assemblyId), inArray(stockMovements.kind, ['draw', 'return_unused', 'reversal'])))
    .groupBy(stockMovements.binId)
    .all();
  return new Map(rows.map((r) => [r.binId, r.n]));
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
 * items by bin code. `drawn` counts every bin of the need's spec, so a draw from a second bin of
 * the same rivet still counts against the assembly.
 */
export function billLines(db: Executor, assemblyId: number, matches: NeedMatch[], extras: ExtraItem[]): BillLine[] {
  const drawn = drawnByBin(db, assemblyId);
  const fasteners = matches.map(({ need, bins: found }): BillLine => {
    const bin = found[0] ?? null;
    const unstocked = bin ? null : unstockedMessage(need);
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
  const codes = [...new Set(extras.map((e) => e.binCode))];
  const byCode = new Map((codes.length ? db.select().from(bins).where(inArray(bins.code, codes)).all() : []).map((b) => [b.code, b]));
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
