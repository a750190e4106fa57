import { estimate, isEstimateErrors } from '@shared/estimate/estimate';
import { isRivetKind } from '@shared/stock/kinds';
import type { BinRow } from '../stock/stock.reads';
import type { PlanningSettings } from '../../settings/planning-settings';
import { binsStocking } from './bill';
import { parseExtraItems, parseLines } from './planning-dto';

/**
 * What one assembly takes from the bins: each need with the bins that stock it (best first, where
 * the remaining need is booked) and the estimate with and without the waste allowance.
 */
export interface BinNeed {
  /** Bins of the need's spec, most on hand first; draws from any of them count against it. */
  binIds: number[];
  /** Rivets without waste (extra items: their quantity). */
  estimated: number;
  withWaste: number;
  rivet: boolean;
}

/** The bins an assembly's needs are looked up in, loaded once per computation. */
export interface BinIndex {
  rivetBins: BinRow[];
  byCode: Map<string, BinRow>;
}

export function binIndex(all: readonly BinRow[]): BinIndex {
  return {
    rivetBins: all.filter((b) => isRivetKind(b.kind)),
    byCode: new Map(all.map((b) => [b.code, b])),
  };
}

export interface AssemblyForNeeds {
  unit: 'in' | 'mm';
  lines: string;
  extraItems: string;
  edgeFloorIn: number | null;
}

/**
 * The assembly's needs that some bin stocks. Lines the estimator refuses (a setting changed since
 * they were saved) add nothing; the assembly page shows why. Unstocked needs are left out.
 */
export function assemblyBinNeeds(a: AssemblyForNeeds, settings: PlanningSettings, index: BinIndex): BinNeed[] {
  const lines = parseLines(a.lines);
  const extras = parseExtraItems(a.extraItems);
  const out: BinNeed[] = [];
  if (lines.length > 0) {
    const result = estimate(
      { unit: a.unit, lines },
      { defaultWastePercent: settings.wastePercent, maxPitchDiameters: settings.maxPitchDiameters, edgeFloorIn: a.edgeFloorIn },
    );
    if (!isEstimateErrors(result)) {
      for (const need of result.needs) {
        const found = binsStocking(index.rivetBins, need);
        if (found.length > 0) out.push({ binIds: found.map((b) => b.id), estimated: need.rivets, withWaste: need.withWaste, rivet: true });
      }
    }
  }
  for (const item of extras) {
    const bin = index.byCode.get(item.binCode);
    if (bin) out.push({ binIds: [bin.id], estimated: item.quantity, withWaste: item.quantity, rivet: false });
  }
  return out;
}
