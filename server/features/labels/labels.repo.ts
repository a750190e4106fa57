import { inArray } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { tools } from '../../db/schema/tools';

/** Code and name of the tools with these codes; codes that match no tool are simply absent. */
export function findToolNames(db: Executor, codes: readonly string[]): Map<string, string> {
  const unique = [...new Set(codes)];
  if (unique.length === 0) return new Map();
  const rows = db.select({ code: tools.code, name: tools.name }).from(tools).where(inArray(tools.code, unique)).all();
  return new Map(rows.map((r) => [r.code, r.name]));
}
