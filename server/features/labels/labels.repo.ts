import { binDesignation } from '@shared/stock/fasteners';
import { binLabelCaution } from '@shared/stock/rivet-cautions';
import type { Executor } from '../../db/client';
import { binsWithCodes } from '../stock/stock.reads';

/** What a label prints under its code: a title and, for some bins, a short caution. */
export interface LabelText {
  title: string;
  caution?: string;
}

/**
 * Code and label text of the bins with these codes: a rivet's designation (the open-standard
 * number or our readable form), otherwise the bin's name, and the caution its kind carries
 * ("Not for structure" on general-purpose blind rivets). Codes that match no bin are absent.
 */
export function findBinLabels(db: Executor, codes: readonly string[]): Map<string, LabelText> {
  return new Map(
    [...binsWithCodes(db, codes).values()].map((bin) => {
      const caution = binLabelCaution(bin.kind);
      return [bin.code, caution ? { title: binDesignation(bin), caution } : { title: binDesignation(bin) }];
    }),
  );
}
