import { inArray } from 'drizzle-orm';
import { binDesignation } from '@shared/stock/fasteners';
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

/**
 * Code and label title of the bins with these codes: a rivet's designation (the open-standard
 * number or our readable form), otherwise the bin's name. Codes that match no bin are absent.
 */
export function findBinTitles(db: Executor, codes: readonly string[]): Map<string, string> {
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
      length16: bins.length16,
    })
    .from(bins)
    .where(inArray(bins.code, unique))
    .all();
  return new Map(rows.map((r) => [r.code, binDesignation(r)]));
}
