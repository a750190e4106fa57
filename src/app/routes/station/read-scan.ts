import { BADGE_TOKEN_PATTERN } from '@shared/schemas/stations';
import { labelPath } from '@/features/tools/utils/label-path';

/** A scanned code at the station: a tool or bin label, a badge (by its token's shape), or nothing of ours. */
export type Scanned = { kind: 'tool' | 'bin'; code: string } | { kind: 'badge'; badge: string } | { kind: 'unknown' };

export function readScan(raw: string): Scanned {
  const path = labelPath(raw);
  if (path) return { kind: path.startsWith('/tools/') ? 'tool' : 'bin', code: raw.trim().toUpperCase() };
  const badge = raw.trim();
  return BADGE_TOKEN_PATTERN.test(badge) ? { kind: 'badge', badge } : { kind: 'unknown' };
}
