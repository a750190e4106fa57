import { inArray } from 'drizzle-orm';
import { binDesignation } from '@shared/stock/fasteners';
import { binLabelCaution } from '@shared/stock/rivet-cautions';
import type { Executor } from '../../db/client';
import { bins } from '../../db/schema/stock';
import { tools } from '../../db/schema/tools';

/** Code and name of the tools with these codes; codes that match no tool are simply absent. */
export function findToolNames(db: Executor, codes: readonly string[]): Map<string, string> {
  const unique = [...new Set(codes)];
  if (unique.length === 0) return new Map();
  const rows = db.select({ code: tools.code, name: tools.name }).from(tools).where(inArray(tools.code, unique)).all();
  return new Map(rows.map((r) => [r.code, r.name]));
}

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
  const unique = [...new Set(codes)];
  if (unique.length === 0) return new Map();
  const rows = db
    .select({
      code: bins.code,
      name: bins.name,
      kind: bins.kind,
      head: bins.head,
      material: bins.material,
      stemMaterial: bins.stemMaterial,
      diameter32: bins.diameter32,
      grip16: bins.grip16,
      gripMin: bins.gripMin,
      gripMax: bins.gripMax,
      length16: bins.length16,
    })
    .from(bins)
    .where(inArray(bins.code, unique))
    .all();
  return new Map(
    rows.map((r) => {
      const caution = binLabelCaution(r.kind);
      return [r.code, caution ? { title: binDesignation(r), caution } : { title: binDesignation(r) }];
    }),
  );
}
